// The side panel of one gate: its state, cross power kappa and outer phase, editable unless locked or read-only.
import { Callout, FormGroup, NumericInput, SegmentedControl, Slider } from '@blueprintjs/core';
import type { ConfigurationFile } from '@hexloom/contracts';
import { setGateSetting, type GateEdit } from '../utils/setGateSetting.js';

type Props = {
  content: ConfigurationFile;
  gateId: string;
  /** Why the gate cannot be changed (read-only role, locked circuit, dead gate), or undefined when it can. */
  readOnlyReason?: string | undefined;
  onChange: (content: ConfigurationFile, coalesceKey: string) => void;
};

/** Shows the setting of `gateId` (parked gates show the parked state) and edits it as a pure content change. */
export function GateInspector({ content, gateId, readOnlyReason, onChange }: Props) {
  const dead = content.mesh.deadGates.includes(gateId);
  const setting = content.gates.find((g) => g.gate === gateId);
  const state = setting?.state ?? content.parkedState;
  const kappa = state === 'split' ? (setting?.kappa ?? 0.5) : state === 'cross' ? 1 : 0;
  const phaseRad = setting?.phaseRad ?? 0;
  const reason = dead ? 'This gate is dead on the chip: no circuit may use it.' : readOnlyReason;
  const change = (edit: Partial<GateEdit>, key: string): void => onChange(setGateSetting(content, gateId, { state, kappa, phaseRad, ...edit }), `${gateId}:${key}`);
  return (
    <section className="hx-stack" data-testid="gate-inspector" aria-label={`Gate ${gateId}`}>
      <h3 className="hx-panel-title">
        Gate <span className="hx-mono">{gateId}</span>
      </h3>
      <p className="hx-muted">
        {setting ? `Set ${state}` : `Parked (${content.parkedState})`}
        {setting?.circuit ? ` · used by circuit ${setting.circuit}` : ' · not used by a circuit'}
      </p>
      {reason && <Callout intent="warning">{reason}</Callout>}
      <FormGroup label="State">
        <div role="group" aria-label="Gate state">
        <SegmentedControl
          disabled={Boolean(reason)}
          value={state}
          options={[
            { label: 'Bar', value: 'bar' },
            { label: 'Cross', value: 'cross' },
            { label: 'Split', value: 'split' },
          ]}
          onValueChange={(v) => change({ state: v as GateEdit['state'] }, 'state')}
        />
        </div>
      </FormGroup>
      <FormGroup label={`Cross power κ = ${kappa.toFixed(3)}`} helperText="0 is bar, 1 is cross">
        <Slider min={0} max={1} stepSize={0.005} labelStepSize={0.25} value={kappa} disabled={Boolean(reason) || state !== 'split'} onChange={(v) => change({ kappa: v }, 'kappa')} handleHtmlProps={{ 'aria-label': `Cross power of ${gateId}` }} />
      </FormGroup>
      <FormGroup label="Outer phase (rad)" labelFor={`phase-${gateId}`}>
        <NumericInput id={`phase-${gateId}`} fill disabled={Boolean(reason)} value={phaseRad} stepSize={0.05} minorStepSize={0.001} majorStepSize={0.5} onValueChange={(v) => Number.isFinite(v) && change({ phaseRad: v }, 'phase')} />
      </FormGroup>
    </section>
  );
}

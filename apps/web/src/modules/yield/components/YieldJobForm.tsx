// The form of a new yield study: circuit, ports by chip label, runs, seed and spreads (prefilled), and the mask used.
import { Button, Callout, FormGroup, HTMLSelect, InputGroup } from '@blueprintjs/core';
import type { ConfigurationVersion, StartYieldJob } from '@hexloom/contracts';
import { type FormEvent, useMemo, useState } from 'react';
import { circuitMask } from '../utils/circuitMask.js';
import { circuitPortOptions } from '../utils/circuitPortOptions.js';
import { DEFAULT_RUNS, DEFAULT_SEED, defaultSpreads, YIELD_GRID } from '../utils/yieldFormDefaults.js';

export type YieldJobFormProps = {
  version: ConfigurationVersion;
  pending: boolean;
  onStart: (body: StartYieldJob) => void;
};

const numberOr = (text: string, fallback: number): number => (text.trim() === '' || !Number.isFinite(Number(text)) ? fallback : Number(text));

/** Builds the POST body from the fields; the server checks the ranges and answers 400 naming a bad field. */
export function YieldJobForm({ version, pending, onStart }: YieldJobFormProps) {
  const { content } = version;
  const spreads = defaultSpreads(content);
  const [circuitId, setCircuitId] = useState(content.circuits[0]?.id);
  const ports = useMemo(() => circuitPortOptions(content, circuitId), [content, circuitId]);
  const [fromId, setFromId] = useState<string | undefined>(ports[0]?.id);
  const [toId, setToId] = useState<string | undefined>(ports[1]?.id);
  const [runs, setRuns] = useState(String(DEFAULT_RUNS));
  const [seed, setSeed] = useState(String(DEFAULT_SEED));
  const [coupler, setCoupler] = useState(String(spreads.couplerSigmaRad));
  const [phase, setPhase] = useState(String(spreads.phaseSigmaRad));
  const from = ports.find((p) => p.id === fromId) ?? ports[0];
  const to = ports.find((p) => p.id === toId && p.id !== from?.id) ?? ports.find((p) => p.id !== from?.id);
  const mask = circuitMask(version, circuitId, to);

  if (content.circuits.length === 0) return <Callout intent="primary">This version has no circuit to study. Place one on the Design tab first.</Callout>;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!from || !to) return;
    onStart({ from: from.id, to: to.id, grid: YIELD_GRID, mask, runs: numberOr(runs, NaN), seed: numberOr(seed, NaN), couplerSigmaRad: numberOr(coupler, NaN), phaseSigmaRad: numberOr(phase, NaN) });
  };
  const changeCircuit = (id: string) => {
    setCircuitId(id);
    const next = circuitPortOptions(content, id);
    setFromId(next[0]?.id);
    setToId(next[1]?.id);
  };

  return (
    <form onSubmit={submit} className="hx-yield-form" data-testid="yield-form" aria-label="New yield study">
      <div className="hx-yield-form-grid">
        <FormGroup label="Circuit" labelFor="yield-circuit">
          <HTMLSelect id="yield-circuit" value={circuitId} onChange={(e) => changeCircuit(e.currentTarget.value)} options={content.circuits.map((c) => ({ value: c.id, label: c.id }))} fill />
        </FormGroup>
        <FormGroup label="From port" labelFor="yield-from">
          <HTMLSelect id="yield-from" value={from?.id} onChange={(e) => setFromId(e.currentTarget.value)} options={ports.map((p) => ({ value: p.id, label: p.label }))} fill />
        </FormGroup>
        <FormGroup label="To port" labelFor="yield-to">
          <HTMLSelect id="yield-to" value={to?.id} onChange={(e) => setToId(e.currentTarget.value)} options={ports.filter((p) => p.id !== from?.id).map((p) => ({ value: p.id, label: p.label }))} fill />
        </FormGroup>
        <FormGroup label="Runs" labelFor="yield-runs" helperText="1 to 20,000">
          <InputGroup id="yield-runs" type="number" min={1} max={20000} step={1} value={runs} onValueChange={setRuns} />
        </FormGroup>
        <FormGroup label="Seed" labelFor="yield-seed" helperText="The same seed gives the same runs">
          <InputGroup id="yield-seed" type="number" min={0} step={1} value={seed} onValueChange={setSeed} />
        </FormGroup>
        <FormGroup label="Coupler splitting spread (rad, 1 sigma)" labelFor="yield-coupler">
          <InputGroup id="yield-coupler" type="number" min={0} max={0.5} step="any" value={coupler} onValueChange={setCoupler} />
        </FormGroup>
        <FormGroup label="Phase spread (rad, 1 sigma)" labelFor="yield-phase">
          <InputGroup id="yield-phase" type="number" min={0} max={1} step="any" value={phase} onValueChange={setPhase} />
        </FormGroup>
      </div>
      <p className="hx-muted">
        {spreads.source === 'chip'
          ? 'Spreads prefilled from the chip technology.'
          : `The chip states no spreads: prefilled with ${spreads.couplerSigmaRad} rad for couplers and ${spreads.phaseSigmaRad} rad for phases.`}{' '}
        Every run perturbs each gate the configuration sets and checks the response from −20 GHz to +20 GHz around the carrier at 401 points.
      </p>
      {mask.regions.length > 0 ? (
        <p data-testid="yield-mask">
          Mask: {mask.regions.length} {mask.regions.length === 1 ? 'region' : 'regions'} from the spec of circuit {circuitId}.
        </p>
      ) : (
        <Callout intent="warning" data-testid="yield-mask">
          Circuit {circuitId} has no saved spec with a mask for this output, so every run meets an empty mask and the yield is 100 %.
        </Callout>
      )}
      <Button type="submit" intent="primary" icon="play" text="Start the yield study" loading={pending} disabled={!from || !to} />
    </form>
  );
}

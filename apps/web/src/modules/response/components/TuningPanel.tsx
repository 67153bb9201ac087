// Live tuning of one circuit: centre frequency, coupler kappas and phases as sliders, a new content on every drag step.
import { Button, Callout } from '@blueprintjs/core';
import type { ConfigurationFile } from '@hexloom/contracts';
import { useState } from 'react';
import { centreShiftHz, centreShiftRangeHz, withCentreShift } from '../utils/centreShift.js';
import { circuitKnobs } from '../utils/circuitKnobs.js';
import { formatValue } from '../utils/formatValue.js';
import { setCouplerKappa } from '../utils/setCouplerKappa.js';
import { setGatePhase } from '../utils/setGatePhase.js';
import '../responsePlots.css';
import { KnobSlider } from './KnobSlider.js';

/** The content to tune, the circuit whose knobs to offer, and where each new content goes. */
export type TuningPanelProps = { content: ConfigurationFile; circuitId: string; onChange: (content: ConfigurationFile) => void };

const TWO_PI = 2 * Math.PI;
const wrap = (rad: number): number => ((rad % TWO_PI) + TWO_PI) % TWO_PI;

/** Sliders on the circuit's knobs; the centre shift counts from the content the panel opened on for this circuit. */
export function TuningPanel({ content, circuitId, onChange }: TuningPanelProps) {
  const [baseline, setBaseline] = useState({ circuitId, content });
  if (baseline.circuitId !== circuitId) setBaseline({ circuitId, content });
  const start = baseline.circuitId === circuitId ? baseline.content : content;
  const knobs = circuitKnobs(content, circuitId);
  if (!knobs) return <Callout intent="warning">There is no circuit {circuitId} in this configuration to tune.</Callout>;
  const rangeHz = centreShiftRangeHz(start, circuitId);
  const shiftGhz = centreShiftHz(start, content, circuitId) / 1e9;
  const nothing = knobs.couplers.length === 0 && knobs.phases.length === 0 && rangeHz === 0;
  return (
    <section className="hx-tuning" aria-label={`Live tuning of circuit ${circuitId}`} data-testid="tuning-panel">
      <h4>Tune circuit {circuitId}</h4>
      {nothing && <p className="hx-muted">This circuit has no coupler, phase shifter or loop to tune.</p>}
      {rangeHz > 0 && (
        <KnobSlider
          label={`Centre frequency shift of circuit ${circuitId}`}
          testId="knob-centre"
          value={shiftGhz}
          min={-rangeHz / 1e9}
          max={rangeHz / 1e9}
          stepSize={Number((rangeHz / 1e9 / 200).toPrecision(2))}
          valueText={`${shiftGhz >= 0 ? '+' : ''}${formatValue(shiftGhz, 'GHz', 3)}`}
          onChange={(g) => onChange(withCentreShift(start, content, circuitId, g * 1e9))}
        />
      )}
      {knobs.couplers.map((c) => (
        <KnobSlider
          key={`k${c.gate}`}
          label={`Coupling of ${c.gate}`}
          testId={`knob-kappa-${c.gate}`}
          value={c.kappa}
          min={0}
          max={1}
          stepSize={0.001}
          valueText={`kappa ${c.kappa.toFixed(3)}, ${(c.kappa * 100).toFixed(1)} % of the power crosses`}
          onChange={(k) => onChange(setCouplerKappa(content, circuitId, c.gate, k))}
        />
      ))}
      {knobs.phases.map((p) => (
        <KnobSlider
          key={`p${p.gate}`}
          label={`Phase of ${p.gate}`}
          testId={`knob-phase-${p.gate}`}
          value={wrap(p.phaseRad)}
          min={0}
          max={Number(TWO_PI.toFixed(3))}
          stepSize={0.001}
          valueText={`${formatValue(wrap(p.phaseRad), 'rad', 3)} (${((wrap(p.phaseRad) * 180) / Math.PI).toFixed(1)}°)`}
          onChange={(rad) => onChange(setGatePhase(content, circuitId, p.gate, rad))}
        />
      ))}
      {!nothing && (
        <Button icon="reset" text="Back to where tuning started" aria-label={`Back to where tuning started, for circuit ${circuitId}`} disabled={start === content} onClick={() => onChange(start)} variant="outlined" />
      )}
    </section>
  );
}

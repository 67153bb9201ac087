// The transversal (N-tap) filter spec: ports, tap weights, the delay between taps and the shape tolerance.
import { fieldError } from '../../utils/fieldError.js';
import type { KindFormProps, TransversalValues } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { TextField } from '../fields/TextField.js';

/** Form of a `transversal` spec. */
export function TransversalForm({ values, onChange, ports, errors }: KindFormProps<TransversalValues>) {
  const set = (patch: Partial<TransversalValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Output port" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <TextField label="Tap weights (relative field amplitudes)" value={values.taps} hint="2 to 16 numbers, comma-separated: 1, 2, 1" inputMode="decimal" onChange={(taps) => set({ taps })} error={fieldError(errors, specPath('taps'))} />
      <NumberField label="Delay between taps" unit="units of length" value={values.tapDelayUnits} hint="even, 2 to 100" onChange={(tapDelayUnits) => set({ tapDelayUnits })} error={fieldError(errors, specPath('tapDelayUnits'))} />
      <NumberField label="Shape tolerance" unit="dB" value={values.shapeToleranceDb} placeholder="default 1" onChange={(shapeToleranceDb) => set({ shapeToleranceDb })} error={fieldError(errors, specPath('shapeToleranceDb'))} />
    </div>
  );
}

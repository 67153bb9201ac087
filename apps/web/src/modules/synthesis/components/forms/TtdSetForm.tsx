// The true-time-delay set spec: one input, ordered outputs, the delay step and its tolerances.
import { fieldError } from '../../utils/fieldError.js';
import type { KindFormProps, TtdSetValues } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { NumberField } from '../fields/NumberField.js';
import { PortListField } from '../fields/PortListField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { DelayBandFields } from './DelayBandFields.js';

/** Form of a `ttd-set` spec. */
export function TtdSetForm({ values, onChange, ports, errors }: KindFormProps<TtdSetValues>) {
  const set = (patch: Partial<TtdSetValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortListField label="Outputs, in delay order" values={values.outputs} ports={ports} max={32} onChange={(outputs) => set({ outputs })} error={fieldError(errors, specPath('outputs'))} />
      <NumberField label="Delay step between outputs" unit="ps" value={values.stepPs} onChange={(stepPs) => set({ stepPs })} error={fieldError(errors, specPath('stepPs'))} />
      <NumberField label="Common delay added to every output" unit="ps" value={values.basePs} placeholder="default: as short as routing allows" onChange={(basePs) => set({ basePs })} error={fieldError(errors, specPath('basePs'))} />
      <NumberField label="Delay tolerance per output" unit="ps" value={values.tolerancePs} placeholder="default: half a unit delay" onChange={(tolerancePs) => set({ tolerancePs })} error={fieldError(errors, specPath('tolerancePs'))} />
      <NumberField label="Largest power imbalance between outputs" unit="dB" value={values.maxImbalanceDb} placeholder="default 1" onChange={(maxImbalanceDb) => set({ maxImbalanceDb })} error={fieldError(errors, specPath('maxImbalanceDb'))} />
      <DelayBandFields values={values} onChange={onChange} errors={errors} />
    </div>
  );
}

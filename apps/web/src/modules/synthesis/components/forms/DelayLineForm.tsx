// The delay-line spec: two ports, a delay in ps or in units, its tolerance and band.
import { fieldError } from '../../utils/fieldError.js';
import type { DelayLineValues, KindFormProps } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { DelayBandFields } from './DelayBandFields.js';

const MODES = [
  { value: 'ps', label: 'In picoseconds' },
  { value: 'units', label: 'In units of length' },
] as const;

/** Form of a `delay-line` spec. */
export function DelayLineForm({ values, onChange, ports, errors }: KindFormProps<DelayLineValues>) {
  const set = (patch: Partial<DelayLineValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Output port" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <ChoiceField label="Delay given" value={values.delayMode} options={MODES} onChange={(delayMode) => set({ delayMode })} />
      <NumberField
        label="Delay"
        unit={values.delayMode === 'ps' ? 'ps' : 'units of length'}
        value={values.delay}
        onChange={(delay) => set({ delay })}
        error={fieldError(errors, specPath(values.delayMode === 'ps' ? 'delay.ps' : 'delay.units'))}
      />
      <NumberField label="Delay tolerance at the carrier" unit="ps" value={values.tolerancePs} placeholder="default: half a unit delay" onChange={(tolerancePs) => set({ tolerancePs })} error={fieldError(errors, specPath('tolerancePs'))} />
      <DelayBandFields values={values} onChange={onChange} errors={errors} />
    </div>
  );
}

// The all-pass delay equaliser spec: ports, the band, a delay or slope target, the number of stages.
import { fieldError } from '../../utils/fieldError.js';
import type { AllPassEqualiserValues, KindFormProps } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';

const TARGETS = [
  { value: 'slope', label: 'Delay slope' },
  { value: 'delay', label: 'Constant extra delay' },
] as const;

/** Form of an `allpass-equaliser` spec. */
export function AllPassEqualiserForm({ values, onChange, ports, errors }: KindFormProps<AllPassEqualiserValues>) {
  const set = (patch: Partial<AllPassEqualiserValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Output port" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <NumberField label="Band start" unit="GHz" value={values.bandFromGHz} onChange={(bandFromGHz) => set({ bandFromGHz })} error={fieldError(errors, specPath('band.fromHz'))} />
      <NumberField label="Band stop" unit="GHz" value={values.bandToGHz} onChange={(bandToGHz) => set({ bandToGHz })} error={fieldError(errors, specPath('band.toHz'))} />
      <ChoiceField label="Target" value={values.targetMode} options={TARGETS} onChange={(targetMode) => set({ targetMode })} />
      {values.targetMode === 'slope' ? (
        <NumberField label="Delay slope" unit="ps/GHz" value={values.slopePsPerGHz} onChange={(slopePsPerGHz) => set({ slopePsPerGHz })} error={fieldError(errors, specPath('target.slopePsPerGHz'))} />
      ) : (
        <NumberField label="Extra delay over the band" unit="ps" value={values.delayPs} onChange={(delayPs) => set({ delayPs })} error={fieldError(errors, specPath('target.delayPs'))} />
      )}
      <NumberField label="Stages (rings, 1–6)" value={values.stages} onChange={(stages) => set({ stages })} error={fieldError(errors, specPath('stages'))} />
      <NumberField label="Delay tolerance over the band" unit="ps" value={values.tolerancePs} placeholder="default: 10 % of the target, at least 1" onChange={(tolerancePs) => set({ tolerancePs })} error={fieldError(errors, specPath('tolerancePs'))} />
    </div>
  );
}

// The ring-notch spec: a bus through two ports, the notch offset, a depth/width/critical target and the ring size.
import { fieldError } from '../../utils/fieldError.js';
import type { KindFormProps, RingNotchValues } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { RingSizeFields } from './RingSizeFields.js';

const TARGETS = [
  { value: 'depth', label: 'Notch depth' },
  { value: 'fwhm', label: 'Notch width (FWHM)' },
  { value: 'critical', label: 'Critical coupling (deepest notch)' },
] as const;
const REGIMES = [
  { value: 'under', label: 'Under-coupled' },
  { value: 'over', label: 'Over-coupled' },
] as const;

/** Form of a `ring-notch` spec. */
export function RingNotchForm({ values, onChange, ports, errors }: KindFormProps<RingNotchValues>) {
  const set = (patch: Partial<RingNotchValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Output port" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <NumberField label="Notch offset from the carrier" unit="GHz" value={values.centreOffsetGHz} onChange={(centreOffsetGHz) => set({ centreOffsetGHz })} error={fieldError(errors, specPath('centreOffsetHz'))} />
      <ChoiceField label="Target" value={values.targetMode} options={TARGETS} onChange={(targetMode) => set({ targetMode })} />
      {values.targetMode === 'depth' && (
        <>
          <NumberField label="Notch depth" unit="dB" value={values.notchDepthDb} onChange={(notchDepthDb) => set({ notchDepthDb })} error={fieldError(errors, specPath('target.notchDepthDb'))} />
          <ChoiceField label="Coupling regime" value={values.regime} options={REGIMES} onChange={(regime) => set({ regime })} />
        </>
      )}
      {values.targetMode === 'fwhm' && (
        <>
          <NumberField label="Notch width at half depth" unit="GHz" value={values.fwhmGHz} onChange={(fwhmGHz) => set({ fwhmGHz })} error={fieldError(errors, specPath('target.fwhmHz'))} />
          <NumberField label="Width tolerance" unit="%" value={values.widthTolerancePercent} placeholder="default 10" onChange={(widthTolerancePercent) => set({ widthTolerancePercent })} error={fieldError(errors, specPath('widthTolerancePercent'))} />
        </>
      )}
      {values.targetMode !== 'fwhm' && (
        <NumberField label="Depth tolerance" unit="dB" value={values.depthToleranceDb} placeholder="default 1" onChange={(depthToleranceDb) => set({ depthToleranceDb })} error={fieldError(errors, specPath('depthToleranceDb'))} />
      )}
      <RingSizeFields values={values} onChange={onChange} errors={errors} />
    </div>
  );
}

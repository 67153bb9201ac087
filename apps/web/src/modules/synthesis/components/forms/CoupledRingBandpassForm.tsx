// The coupled-ring band-pass spec: ports, response type and order, ripple (Chebyshev), band width and offset.
import { fieldError } from '../../utils/fieldError.js';
import type { CoupledRingBandpassValues, KindFormProps } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';

const RESPONSES = [
  { value: 'butterworth', label: 'Butterworth (maximally flat)' },
  { value: 'chebyshev', label: 'Chebyshev (equal ripple)' },
] as const;

/** Form of a `coupled-ring-bandpass` spec. */
export function CoupledRingBandpassForm({ values, onChange, ports, errors }: KindFormProps<CoupledRingBandpassValues>) {
  const set = (patch: Partial<CoupledRingBandpassValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Filtered (drop) output" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <PortSelect label="Through port" value={values.through} ports={ports} onChange={(through) => set({ through })} error={fieldError(errors, specPath('through'))} />
      <ChoiceField label="Response" value={values.response} options={RESPONSES} onChange={(response) => set({ response })} />
      <NumberField label="Order (number of rings, 1–8)" value={values.order} onChange={(order) => set({ order })} error={fieldError(errors, specPath('order'))} />
      {values.response === 'chebyshev' && (
        <NumberField label="Pass-band ripple" unit="dB" value={values.rippleDb} onChange={(rippleDb) => set({ rippleDb })} error={fieldError(errors, specPath('rippleDb'))} />
      )}
      <NumberField label="Pass-band width" unit="GHz" value={values.bandwidthGHz} onChange={(bandwidthGHz) => set({ bandwidthGHz })} error={fieldError(errors, specPath('bandwidthHz'))} />
      <NumberField label="Band centre offset from the carrier" unit="GHz" value={values.centreOffsetGHz} onChange={(centreOffsetGHz) => set({ centreOffsetGHz })} error={fieldError(errors, specPath('centreOffsetHz'))} />
      <NumberField label="Width tolerance" unit="%" value={values.widthTolerancePercent} placeholder="default 15" onChange={(widthTolerancePercent) => set({ widthTolerancePercent })} error={fieldError(errors, specPath('widthTolerancePercent'))} />
    </div>
  );
}

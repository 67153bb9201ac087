// The band a delay must hold over (GHz offsets from the carrier) and its largest ripple.
import { fieldError } from '../../utils/fieldError.js';
import type { DelayBandValues, FieldErrors } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { NumberField } from '../fields/NumberField.js';

type Props<V extends DelayBandValues> = { values: V; onChange: (next: V) => void; errors: FieldErrors };

/** `bandHz` and `maxDelayRipplePs` of delay-line and ttd-set specs; both band ends blank means −1 to +1 GHz. */
export function DelayBandFields<V extends DelayBandValues>({ values, onChange, errors }: Props<V>) {
  return (
    <>
      <NumberField label="Delay band start" unit="GHz" value={values.bandFromGHz} placeholder="default −1" onChange={(bandFromGHz) => onChange({ ...values, bandFromGHz })} error={fieldError(errors, specPath('bandHz.fromHz'))} />
      <NumberField label="Delay band stop" unit="GHz" value={values.bandToGHz} placeholder="default +1" onChange={(bandToGHz) => onChange({ ...values, bandToGHz })} error={fieldError(errors, specPath('bandHz.toHz'))} />
      <NumberField label="Largest delay ripple over the band" unit="ps" value={values.maxDelayRipplePs} placeholder="default: twice the tolerance" onChange={(maxDelayRipplePs) => onChange({ ...values, maxDelayRipplePs })} error={fieldError(errors, specPath('maxDelayRipplePs'))} />
    </>
  );
}

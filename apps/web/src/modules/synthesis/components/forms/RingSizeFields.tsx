// How big the ring is: the smallest ring (largest FSR), a perimeter in units, or an FSR in GHz.
import { fieldError } from '../../utils/fieldError.js';
import type { FieldErrors, RingSizeValues } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';

const MODES = [
  { value: 'free', label: 'Smallest ring (largest FSR)' },
  { value: 'perimeter', label: 'Perimeter in units' },
  { value: 'fsr', label: 'Free spectral range' },
] as const;

type Props<V extends RingSizeValues> = { values: V; onChange: (next: V) => void; errors: FieldErrors };

/** The `ring` field of ring-notch and add-drop specs. */
export function RingSizeFields<V extends RingSizeValues>({ values, onChange, errors }: Props<V>) {
  return (
    <>
      <ChoiceField label="Ring size" value={values.ringMode} options={MODES} onChange={(ringMode) => onChange({ ...values, ringMode })} />
      {values.ringMode === 'perimeter' && (
        <NumberField label="Ring perimeter" unit="units of length" value={values.perimeterUnits} onChange={(perimeterUnits) => onChange({ ...values, perimeterUnits })} error={fieldError(errors, specPath('ring.perimeterUnits'))} hint="6, 10, 12, 14… units draw on a hexagonal mesh" />
      )}
      {values.ringMode === 'fsr' && (
        <NumberField label="Ring FSR" unit="GHz" value={values.fsrGHz} onChange={(fsrGHz) => onChange({ ...values, fsrGHz })} error={fieldError(errors, specPath('ring.fsrHz'))} hint="the nearest ring of whole units is built" />
      )}
    </>
  );
}

// The Mach–Zehnder lattice spec: ports, band shape, order, arm difference, band placement, rejection or polynomial.
import { fieldError } from '../../utils/fieldError.js';
import type { KindFormProps, MziLatticeValues } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { ChoiceField } from '../fields/ChoiceField.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { TextField } from '../fields/TextField.js';

const BANDS = [
  { value: 'band-pass', label: 'Band-pass' },
  { value: 'band-stop', label: 'Band-stop' },
  { value: 'half-band', label: 'Half-band' },
  { value: 'polynomial', label: 'Given polynomial A(z)' },
] as const;

/** Form of an `mzi-lattice` spec. */
export function MziLatticeForm({ values, onChange, ports, errors }: KindFormProps<MziLatticeValues>) {
  const set = (patch: Partial<MziLatticeValues>) => onChange({ ...values, ...patch });
  const polynomial = values.band === 'polynomial';
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Output port" value={values.to} ports={ports} onChange={(to) => set({ to })} error={fieldError(errors, specPath('to'))} />
      <ChoiceField label="Response" value={values.band} options={BANDS} onChange={(band) => set({ band })} />
      <NumberField label="Order (number of stages, 1–16)" value={values.order} onChange={(order) => set({ order })} error={fieldError(errors, specPath('order'))} />
      <NumberField label="Arm length difference per stage" unit="units of length" value={values.armDifferenceUnits} hint="even, 2 to 40" onChange={(armDifferenceUnits) => set({ armDifferenceUnits })} error={fieldError(errors, specPath('armDifferenceUnits'))} />
      <NumberField label="Band centre offset from the carrier" unit="GHz" value={values.centreOffsetGHz} onChange={(centreOffsetGHz) => set({ centreOffsetGHz })} error={fieldError(errors, specPath('centreOffsetHz'))} />
      {!polynomial && (
        <NumberField label="Band width" unit="GHz" value={values.widthGHz} placeholder={values.band === 'half-band' ? 'default: half the lattice FSR' : undefined} onChange={(widthGHz) => set({ widthGHz })} error={fieldError(errors, specPath('widthHz'))} />
      )}
      <NumberField label="Stop-band rejection" unit="dB" value={values.rejectionDb} onChange={(rejectionDb) => set({ rejectionDb })} error={fieldError(errors, specPath('rejectionDb'))} />
      {polynomial ? (
        <>
          <TextField label="Coefficients of A(z), from z⁰ up" value={values.coefficients} hint="comma-separated, real or complex: 0.5, 0.3+0.2j" onChange={(coefficients) => set({ coefficients })} error={fieldError(errors, specPath('coefficients'))} />
          <NumberField label="Shape tolerance" unit="dB" value={values.shapeToleranceDb} placeholder="default 1" onChange={(shapeToleranceDb) => set({ shapeToleranceDb })} error={fieldError(errors, specPath('shapeToleranceDb'))} />
        </>
      ) : (
        <NumberField label="Rejection tolerance" unit="dB" value={values.rejectionToleranceDb} placeholder="default 1" onChange={(rejectionToleranceDb) => set({ rejectionToleranceDb })} error={fieldError(errors, specPath('rejectionToleranceDb'))} />
      )}
    </div>
  );
}

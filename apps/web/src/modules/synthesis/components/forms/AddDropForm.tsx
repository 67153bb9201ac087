// The add-drop spec: input, through and drop ports, the dropped band (offset, width) and the ring size.
import { fieldError } from '../../utils/fieldError.js';
import type { AddDropValues, KindFormProps } from '../../utils/specFormValues.js';
import { specPath } from '../../utils/specPath.js';
import { NumberField } from '../fields/NumberField.js';
import { PortSelect } from '../fields/PortSelect.js';
import { RingSizeFields } from './RingSizeFields.js';

/** Form of an `add-drop` spec. */
export function AddDropForm({ values, onChange, ports, errors }: KindFormProps<AddDropValues>) {
  const set = (patch: Partial<AddDropValues>) => onChange({ ...values, ...patch });
  return (
    <div className="hx-synth-grid">
      <PortSelect label="Input port" value={values.from} ports={ports} onChange={(from) => set({ from })} error={fieldError(errors, specPath('from'))} />
      <PortSelect label="Through port" value={values.through} ports={ports} onChange={(through) => set({ through })} error={fieldError(errors, specPath('through'))} />
      <PortSelect label="Drop port" value={values.drop} ports={ports} onChange={(drop) => set({ drop })} error={fieldError(errors, specPath('drop'))} />
      <NumberField label="Band centre offset from the carrier" unit="GHz" value={values.centreOffsetGHz} onChange={(centreOffsetGHz) => set({ centreOffsetGHz })} error={fieldError(errors, specPath('centreOffsetHz'))} />
      <NumberField label="Drop bandwidth (3 dB)" unit="GHz" value={values.bandwidthGHz} onChange={(bandwidthGHz) => set({ bandwidthGHz })} error={fieldError(errors, specPath('bandwidthHz'))} />
      <NumberField label="Width tolerance" unit="%" value={values.widthTolerancePercent} placeholder="default 15" onChange={(widthTolerancePercent) => set({ widthTolerancePercent })} error={fieldError(errors, specPath('widthTolerancePercent'))} />
      <RingSizeFields values={values} onChange={onChange} errors={errors} />
    </div>
  );
}

// The form of whichever spec kind is chosen.
import type { FieldErrors, PortOption, SpecFormValues } from '../utils/specFormValues.js';
import { AddDropForm } from './forms/AddDropForm.js';
import { AllPassEqualiserForm } from './forms/AllPassEqualiserForm.js';
import { CoupledRingBandpassForm } from './forms/CoupledRingBandpassForm.js';
import { DelayLineForm } from './forms/DelayLineForm.js';
import { MziLatticeForm } from './forms/MziLatticeForm.js';
import { RingNotchForm } from './forms/RingNotchForm.js';
import { TransversalForm } from './forms/TransversalForm.js';
import { TtdSetForm } from './forms/TtdSetForm.js';

export type SpecFormProps = { values: SpecFormValues; onChange: (next: SpecFormValues) => void; ports: PortOption[]; errors: FieldErrors };

/** Dispatches on `values.kind` to that kind's own form. */
export function SpecForm({ values, onChange, ports, errors }: SpecFormProps) {
  const common = { onChange, ports, errors };
  switch (values.kind) {
    case 'delay-line':
      return <DelayLineForm values={values} {...common} />;
    case 'ttd-set':
      return <TtdSetForm values={values} {...common} />;
    case 'ring-notch':
      return <RingNotchForm values={values} {...common} />;
    case 'add-drop':
      return <AddDropForm values={values} {...common} />;
    case 'coupled-ring-bandpass':
      return <CoupledRingBandpassForm values={values} {...common} />;
    case 'mzi-lattice':
      return <MziLatticeForm values={values} {...common} />;
    case 'transversal':
      return <TransversalForm values={values} {...common} />;
    case 'allpass-equaliser':
      return <AllPassEqualiserForm values={values} {...common} />;
  }
}

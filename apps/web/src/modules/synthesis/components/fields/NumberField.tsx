// A number typed in the unit the user thinks in (GHz, ps, dB, units), labelled with that unit.
import type { ReactNode } from 'react';
import { TextField } from './TextField.js';

export type NumberFieldProps = {
  /** Label without the unit ("Centre offset"). */
  label: string;
  /** Unit shown in the label ("GHz"); none for counts. */
  unit?: string;
  value: string;
  onChange: (value: string) => void;
  error?: string | undefined;
  /** For optional fields: what a blank field means ("default: half a unit delay"). */
  placeholder?: string;
  hint?: ReactNode;
};

/** A decimal text field; parsing and range checks happen on submit against the contract's schema. */
export function NumberField({ label, unit, ...rest }: NumberFieldProps) {
  return <TextField label={unit ? `${label} (${unit})` : label} inputMode="decimal" {...rest} />;
}

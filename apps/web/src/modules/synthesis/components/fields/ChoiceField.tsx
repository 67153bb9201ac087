// A labelled select among a few worded options (a kind, a regime, a response type...).
import { FormGroup, HTMLSelect } from '@blueprintjs/core';
import { useId } from 'react';

export type ChoiceFieldProps<T extends string> = {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  testId?: string;
};

/** FormGroup + HTMLSelect; the value is always one of `options`. */
export function ChoiceField<T extends string>({ label, value, options, onChange, testId }: ChoiceFieldProps<T>) {
  const id = useId();
  return (
    <FormGroup label={label} labelFor={id} className="hx-synth-field">
      <HTMLSelect id={id} value={value} fill data-testid={testId} onChange={(event) => onChange(event.currentTarget.value as T)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </HTMLSelect>
    </FormGroup>
  );
}

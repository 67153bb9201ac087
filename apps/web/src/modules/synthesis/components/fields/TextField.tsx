// A labelled text input with its error in words under it (also used for numbers, typed as text).
import { FormGroup, InputGroup } from '@blueprintjs/core';
import { useId, type ReactNode } from 'react';

export type TextFieldProps = {
  /** Visible label, the unit included ("Bandwidth (GHz)"). */
  label: string;
  value: string;
  onChange: (value: string) => void;
  error?: string | undefined;
  placeholder?: string;
  /** Shown under the field when there is no error. */
  hint?: ReactNode;
  inputMode?: 'text' | 'decimal' | 'numeric';
  testId?: string;
};

/** FormGroup + InputGroup; the error is linked to the input with aria-describedby and marks it invalid. */
export function TextField({ label, value, onChange, error, placeholder, hint, inputMode = 'text', testId }: TextFieldProps) {
  const id = useId();
  const noteId = `${id}-note`;
  const note = error ?? hint;
  return (
    <FormGroup label={label} labelFor={id} intent={error ? 'danger' : 'none'} helperText={note ? <span id={noteId}>{note}</span> : undefined} className="hx-synth-field">
      <InputGroup
        id={id}
        value={value}
        onValueChange={(next) => onChange(next)}
        placeholder={placeholder}
        inputMode={inputMode}
        intent={error ? 'danger' : 'none'}
        aria-invalid={error ? true : undefined}
        aria-describedby={note ? noteId : undefined}
        data-testid={testId}
      />
    </FormGroup>
  );
}

// Picks one of the chip's free ports, listed by label ("W11 · fibre"), never by internal id.
import { FormGroup } from '@blueprintjs/core';
import { useId } from 'react';
import type { PortOption } from '../../utils/specFormValues.js';
import { PortOptions } from './PortOptions.js';

export type PortSelectProps = {
  label: string;
  value: string;
  ports: readonly PortOption[];
  onChange: (ref: string) => void;
  error?: string | undefined;
  /** Text of the blank choice ("Choose a port", or "Main outputs" where blank is allowed). */
  blankLabel?: string;
};

/** A select of free ports; the blank choice stays first so a missing port is visible. */
export function PortSelect({ label, value, ports, onChange, error, blankLabel = 'Choose a port' }: PortSelectProps) {
  const id = useId();
  const noteId = `${id}-note`;
  return (
    <FormGroup label={label} labelFor={id} intent={error ? 'danger' : 'none'} helperText={error ? <span id={noteId}>{error}</span> : undefined} className="hx-synth-field">
      <PortOptions id={id} value={value} ports={ports} onChange={onChange} blankLabel={blankLabel} invalid={Boolean(error)} describedBy={error ? noteId : undefined} />
    </FormGroup>
  );
}

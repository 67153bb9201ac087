// An ordered list of output ports (a delay set's outputs: output k is delayed by base + k x step).
import { Button, FormGroup } from '@blueprintjs/core';
import { useId } from 'react';
import type { PortOption } from '../../utils/specFormValues.js';
import { PortOptions } from './PortOptions.js';

export type PortListFieldProps = {
  label: string;
  values: readonly string[];
  ports: readonly PortOption[];
  onChange: (refs: string[]) => void;
  error?: string | undefined;
  /** Most entries allowed (the schema's maximum). */
  max: number;
};

/** One select per output with a remove button, and an "Add output" button. */
export function PortListField({ label, values, ports, onChange, error, max }: PortListFieldProps) {
  const id = useId();
  const noteId = `${id}-note`;
  const set = (k: number, ref: string) => onChange(values.map((v, j) => (j === k ? ref : v)));
  return (
    <FormGroup label={label} intent={error ? 'danger' : 'none'} helperText={error ? <span id={noteId}>{error}</span> : undefined} className="hx-synth-field">
      <ol className="hx-synth-port-list" aria-describedby={error ? noteId : undefined}>
        {values.map((value, k) => (
          <li key={k} className="hx-synth-port-item">
            <PortOptions value={value} ports={ports} onChange={(ref) => set(k, ref)} blankLabel="Choose a port" ariaLabel={`Output ${k + 1}`} />
            <Button variant="minimal" icon="cross" aria-label={`Remove output ${k + 1}`} onClick={() => onChange(values.filter((_, j) => j !== k))} />
          </li>
        ))}
      </ol>
      <Button icon="add" text="Add output" variant="outlined" size="small" disabled={values.length >= max} onClick={() => onChange([...values, ''])} />
    </FormGroup>
  );
}

// The bare select of free ports by label, for table cells and lists that carry their own label.
import { HTMLSelect } from '@blueprintjs/core';
import type { PortOption } from '../../utils/specFormValues.js';

export type PortOptionsProps = { id?: string; value: string; ports: readonly PortOption[]; onChange: (ref: string) => void; blankLabel: string; invalid?: boolean; describedBy?: string | undefined; ariaLabel?: string };

/** The bare select, for table cells and lists that carry their own label. */
export function PortOptions({ id, value, ports, onChange, blankLabel, invalid, describedBy, ariaLabel }: PortOptionsProps) {
  return (
    <HTMLSelect id={id} value={value} fill aria-label={ariaLabel} aria-invalid={invalid || undefined} aria-describedby={describedBy} onChange={(event) => onChange(event.currentTarget.value)}>
      <option value="">{blankLabel}</option>
      {ports.map((p) => (
        <option key={p.ref} value={p.ref}>
          {p.wiredTo && p.wiredTo !== 'none' ? `${p.label} · ${p.wiredTo}` : p.label}
        </option>
      ))}
    </HTMLSelect>
  );
}

// Two selects that choose the versions to compare: A (before) and B (after).
import { FormGroup, HTMLSelect } from '@blueprintjs/core';
import type { VersionSummary } from '@hexloom/contracts';
import { useId } from 'react';

/** Props of {@link VersionPicker}. */
export type VersionPickerProps = {
  versions: readonly VersionSummary[];
  a: number | undefined;
  b: number | undefined;
  onChange: (next: { a: number; b: number }) => void;
};

/** Each select lists every version, newest first; picking the same number twice is allowed and explained by the diff. */
export function VersionPicker({ versions, a, b, onChange }: VersionPickerProps) {
  const id = useId();
  const numbers = [...versions].map((v) => v.number).sort((x, y) => y - x);
  const options = numbers.map((n) => ({ value: String(n), label: `v${n}` }));
  const first = numbers[0] ?? 1;
  return (
    <div className="hx-version-picker" data-testid="version-picker">
      <FormGroup label="Compare version A" labelFor={`${id}-a`} inline>
        <HTMLSelect id={`${id}-a`} value={String(a ?? first)} options={options} onChange={(e) => onChange({ a: Number(e.currentTarget.value), b: b ?? first })} />
      </FormGroup>
      <FormGroup label="with version B" labelFor={`${id}-b`} inline>
        <HTMLSelect id={`${id}-b`} value={String(b ?? first)} options={options} onChange={(e) => onChange({ a: a ?? first, b: Number(e.currentTarget.value) })} />
      </FormGroup>
    </div>
  );
}

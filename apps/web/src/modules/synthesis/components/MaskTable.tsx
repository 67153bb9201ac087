// The mask edited as a small table: one row per region (pass, stop, delay), band in GHz, limits with units, optional port.
import { Button, HTMLSelect, HTMLTable, InputGroup } from '@blueprintjs/core';
import { fieldError } from '../utils/fieldError.js';
import { emptyMaskRow } from '../utils/emptyMaskRow.js';
import { maskPath } from '../utils/specPath.js';
import type { FieldErrors, MaskRow, PortOption } from '../utils/specFormValues.js';
import { PortOptions } from './fields/PortOptions.js';

export type MaskTableProps = {
  rows: readonly MaskRow[];
  onChange: (rows: MaskRow[]) => void;
  /** Ports a row may name (the circuit's outputs); blank means the main outputs. */
  ports: readonly PortOption[];
  /** Errors keyed by body path ("spec.mask.regions.0.range.toHz"). */
  errors?: FieldErrors;
};

type LimitKey = 'maxInsertionLossDb' | 'maxRippleDb' | 'minRejectionDb' | 'maxDelayRipplePs' | 'delayPs' | 'delayTolerancePs';

/** Limits each region kind takes, in words and units; `optional` ones may stay blank. */
const LIMITS: Record<MaskRow['kind'], { key: LimitKey; label: string; optional: boolean }[]> = {
  pass: [
    { key: 'maxInsertionLossDb', label: 'Most insertion loss (dB)', optional: true },
    { key: 'maxRippleDb', label: 'Most ripple (dB)', optional: true },
  ],
  stop: [{ key: 'minRejectionDb', label: 'Least rejection (dB)', optional: false }],
  delay: [
    { key: 'maxDelayRipplePs', label: 'Most delay ripple (ps)', optional: true },
    { key: 'delayPs', label: 'Mean delay (ps)', optional: true },
    { key: 'delayTolerancePs', label: 'Delay tolerance (ps)', optional: true },
  ],
};

const KINDS = [
  { value: 'pass', label: 'Pass band' },
  { value: 'stop', label: 'Stop band' },
  { value: 'delay', label: 'Group delay' },
] as const;

function CellError({ text }: { text: string | undefined }) {
  return text ? <div className="hx-synth-cell-error">{text}</div> : null;
}

/** Editable mask rows with add and remove buttons; exported so the response plot can show the same mask. */
export function MaskTable({ rows, onChange, ports, errors = {} }: MaskTableProps) {
  const update = (k: number, patch: Partial<MaskRow>) => onChange(rows.map((row, j) => (j === k ? { ...row, ...patch } : row)));
  return (
    <div className="hx-synth-mask" data-testid="mask-table">
      {rows.length === 0 ? (
        <p className="hx-muted">No mask: only the spec's own targets are checked.</p>
      ) : (
        <div className="hx-synth-mask-scroll">
          <HTMLTable compact className="hx-full-width">
            <thead>
              <tr>
                <th scope="col">Region</th>
                <th scope="col">Band start (GHz)</th>
                <th scope="col">Band stop (GHz)</th>
                <th scope="col">Limits</th>
                <th scope="col">Output</th>
                <th scope="col">
                  <span className="bp6-text-muted">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row, k) => {
                const n = k + 1;
                return (
                  <tr key={row.key}>
                    <td>
                      <HTMLSelect aria-label={`Mask row ${n} region`} value={row.kind} onChange={(e) => update(k, { kind: e.currentTarget.value as MaskRow['kind'] })}>
                        {KINDS.map((o) => (
                          <option key={o.value} value={o.value}>
                            {o.label}
                          </option>
                        ))}
                      </HTMLSelect>
                    </td>
                    <td>
                      <InputGroup aria-label={`Mask row ${n} band start (GHz)`} inputMode="decimal" value={row.fromGHz} onValueChange={(fromGHz) => update(k, { fromGHz })} intent={fieldError(errors, maskPath(k, 'range.fromHz')) ? 'danger' : 'none'} />
                      <CellError text={fieldError(errors, maskPath(k, 'range.fromHz'))} />
                    </td>
                    <td>
                      <InputGroup aria-label={`Mask row ${n} band stop (GHz)`} inputMode="decimal" value={row.toGHz} onValueChange={(toGHz) => update(k, { toGHz })} intent={fieldError(errors, maskPath(k, 'range.toHz')) ? 'danger' : 'none'} />
                      <CellError text={fieldError(errors, maskPath(k, 'range.toHz'))} />
                    </td>
                    <td className="hx-synth-limits">
                      {LIMITS[row.kind].map((limit) => (
                        <div key={limit.key} className="hx-synth-limit">
                          <span className="hx-synth-limit-label">{limit.label}</span>
                          <InputGroup
                            aria-label={`Mask row ${n} ${limit.label.charAt(0).toLowerCase()}${limit.label.slice(1)}`}
                            inputMode="decimal"
                            placeholder={limit.optional ? 'none' : undefined}
                            value={row[limit.key]}
                            onValueChange={(value) => update(k, { [limit.key]: value })}
                            intent={fieldError(errors, maskPath(k, limit.key)) ? 'danger' : 'none'}
                          />
                          <CellError text={fieldError(errors, maskPath(k, limit.key))} />
                        </div>
                      ))}
                    </td>
                    <td>
                      <PortOptions ariaLabel={`Mask row ${n} output`} value={row.port} ports={ports} blankLabel="Main outputs" onChange={(port) => update(k, { port })} />
                      <CellError text={fieldError(errors, maskPath(k, 'port'))} />
                    </td>
                    <td>
                      <Button variant="minimal" icon="trash" aria-label={`Remove mask row ${n}`} onClick={() => onChange(rows.filter((_, j) => j !== k))} />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
        </div>
      )}
      <Button icon="add" text="Add mask row" variant="outlined" size="small" disabled={rows.length >= 32} onClick={() => onChange([...rows, emptyMaskRow('pass')])} />
    </div>
  );
}

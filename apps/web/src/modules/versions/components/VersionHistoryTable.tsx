// The version history of a configuration, newest first; each row opens its version by mouse or keyboard.
import { HTMLTable } from '@blueprintjs/core';
import type { VersionSummary } from '@hexloom/contracts';
import { StatusTag } from '../../chips/components/StatusTag.js';
import { formatDate } from '../../teams/utils/formatDate.js';

/** Props of {@link VersionHistoryTable}. */
export type VersionHistoryTableProps = {
  versions: readonly VersionSummary[];
  /** The version the workspace shows (marked as selected). */
  current: number;
  /** The two versions being compared, marked "A" and "B" in their rows. */
  compared: { a: number | undefined; b: number | undefined };
  onOpen: (n: number) => void;
};

/** Rows are focusable: Tab reaches them, Enter or Space opens the version. */
export function VersionHistoryTable({ versions, current, compared, onOpen }: VersionHistoryTableProps) {
  const sorted = [...versions].sort((x, y) => y.number - x.number);
  return (
    <div className="hx-version-history">
      <HTMLTable compact interactive className="hx-full-width" data-testid="version-history" aria-label="Version history, newest first">
        <thead>
          <tr>
            <th scope="col">Version</th>
            <th scope="col">Status</th>
            <th scope="col">Author</th>
            <th scope="col">Saved</th>
            <th scope="col">Approved</th>
            <th scope="col">Note</th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((v) => {
            const slot = v.number === compared.a ? ' (A)' : v.number === compared.b ? ' (B)' : '';
            return (
              <tr
                key={v.number}
                tabIndex={0}
                aria-selected={v.number === current}
                aria-label={`Open version ${v.number}${v.number === current ? ', shown now' : ''}`}
                onClick={() => onOpen(v.number)}
                onKeyDown={(e) => (e.key === 'Enter' || e.key === ' ') && (e.preventDefault(), onOpen(v.number))}
                className={v.number === current ? 'hx-selected' : undefined}
                data-testid={`history-version-${v.number}`}
              >
                <td className="hx-mono">
                  v{v.number}
                  {slot && <strong>{slot}</strong>}
                </td>
                <td>
                  <StatusTag status={v.status} />
                </td>
                <td className="hx-mono">{v.author}</td>
                <td className="hx-nowrap">{formatDate(v.createdAt)}</td>
                <td>{v.approvedBy ? `by ${v.approvedBy}${v.approvedAt ? ` on ${formatDate(v.approvedAt)}` : ''}` : <span className="hx-muted">not approved</span>}</td>
                <td>{v.note || <span className="hx-muted">no note</span>}</td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}

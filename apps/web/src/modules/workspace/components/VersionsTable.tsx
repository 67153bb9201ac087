// The versions of a configuration, newest first; each row opens that version (by mouse or keyboard).
import { HTMLTable } from '@blueprintjs/core';
import type { VersionSummary } from '@hexloom/contracts';
import { StatusTag } from '../../chips/components/StatusTag.js';
import { formatDate } from '../../teams/utils/formatDate.js';

/** Rows are buttons for assistive technology: Tab reaches them, Enter or Space opens the version. */
export function VersionsTable({ versions, current, onOpen }: { versions: VersionSummary[]; current: number; onOpen: (n: number) => void }) {
  return (
    <HTMLTable compact interactive className="hx-full-width" data-testid="versions-table" aria-label="Versions">
      <thead>
        <tr>
          <th>Version</th>
          <th>Status</th>
          <th>Author</th>
          <th>Saved</th>
          <th>Approved by</th>
          <th>Note</th>
        </tr>
      </thead>
      <tbody>
        {[...versions].sort((a, b) => b.number - a.number).map((v) => (
          <tr
            key={v.number}
            tabIndex={0}
            aria-selected={v.number === current}
            aria-label={`Open version ${v.number}`}
            onClick={() => onOpen(v.number)}
            onKeyDown={(e) => (e.key === 'Enter' || e.key === ' ') && (e.preventDefault(), onOpen(v.number))}
            className={v.number === current ? 'hx-selected' : undefined}
            data-testid={`version-${v.number}`}
          >
            <td className="hx-mono">v{v.number}</td>
            <td>
              <StatusTag status={v.status} />
            </td>
            <td className="hx-mono">{v.author}</td>
            <td className="hx-mono">{formatDate(v.createdAt)}</td>
            <td className="hx-mono">{v.approvedBy ?? ''}</td>
            <td>{v.note}</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

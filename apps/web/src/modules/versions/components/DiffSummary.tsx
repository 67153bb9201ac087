// The headline of a diff: how many gates changed, and which circuits were added, removed or changed.
import { Tag } from '@blueprintjs/core';
import type { VersionDiff } from '@hexloom/contracts';

const plural = (n: number, one: string, many: string): string => `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;

function CircuitList({ title, ids, intent, testId }: { title: string; ids: readonly string[]; intent: 'success' | 'danger' | 'warning'; testId: string }) {
  return (
    <div data-testid={testId}>
      <dt>{title}</dt>
      <dd>
        {ids.length === 0 ? (
          <span className="hx-muted">none</span>
        ) : (
          <ul className="hx-diff-circuits">
            {ids.map((id) => (
              <li key={id}>
                <Tag minimal intent={intent} className="hx-mono">
                  {id}
                </Tag>
              </li>
            ))}
          </ul>
        )}
      </dd>
    </div>
  );
}

/** Counts in words ("3 gates changed") and the circuit lists as tags; says so when the versions are the same. */
export function DiffSummary({ diff }: { diff: VersionDiff }) {
  const nothing = diff.gatesChanged.length === 0 && diff.circuitsAdded.length + diff.circuitsRemoved.length + diff.circuitsChanged.length === 0 && !diff.parkedStateChanged;
  return (
    <section aria-label={`Summary of the changes from v${diff.from} to v${diff.to}`} data-testid="diff-summary">
      <p data-testid="diff-gate-count">
        <strong>{plural(diff.gatesChanged.length, 'gate changed', 'gates changed')}</strong>
        {diff.parkedStateChanged && ', and the parked state of idle gates changed'}
        {nothing && ': the two versions set the chip the same way'}.
      </p>
      <dl className="hx-diff-summary">
        <CircuitList title="Circuits added" ids={diff.circuitsAdded} intent="success" testId="circuits-added" />
        <CircuitList title="Circuits removed" ids={diff.circuitsRemoved} intent="danger" testId="circuits-removed" />
        <CircuitList title="Circuits changed" ids={diff.circuitsChanged} intent="warning" testId="circuits-changed" />
      </dl>
    </section>
  );
}

// The circuits already on the chip, verified again on the proposed content (leakage couples them a little).
import { Tag } from '@blueprintjs/core';
import type { Proposal } from '@hexloom/contracts';

type Other = Extract<Proposal, { ok: true }>['others'][number];

/** One line per other circuit: still passing, or which of its checks now fail. */
export function OtherCircuits({ others }: { others: readonly Other[] }) {
  return (
    <section data-testid="other-circuits">
      <h4 className="hx-synth-output-title">Other circuits on the chip</h4>
      {others.length === 0 ? (
        <p className="hx-muted">No other circuit with a spec to check again.</p>
      ) : (
        <ul className="hx-synth-notes">
          {others.map((other) => (
            <li key={other.circuitId}>
              <span className="hx-mono">{other.circuitId}</span>{' '}
              <Tag minimal intent={other.pass ? 'success' : 'danger'}>
                {other.pass ? 'Still passes' : 'Now fails'}
              </Tag>
              {other.failed.length > 0 && <span> — failed: {other.failed.join('; ')}</span>}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

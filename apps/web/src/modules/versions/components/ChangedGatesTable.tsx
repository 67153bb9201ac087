// The gates two versions set differently, as a table beside the mesh: the gate, its setting in A and in B.
import { Button, HTMLTable } from '@blueprintjs/core';
import type { GateChange } from '@hexloom/contracts';
import { useState } from 'react';
import { describeGateSetting } from '../utils/describeGateSetting.js';

const FIRST = 40;

/** Props of {@link ChangedGatesTable}. */
export type ChangedGatesTableProps = { changes: readonly GateChange[]; from: number; to: number; parkedA: 'bar' | 'cross'; parkedB: 'bar' | 'cross' };

/** The first 40 rows, then "Show all N"; each setting in words ("split, 30 % cross-coupling, circuit notch"). */
export function ChangedGatesTable({ changes, from, to, parkedA, parkedB }: ChangedGatesTableProps) {
  const [all, setAll] = useState(false);
  if (changes.length === 0) return <p className="hx-muted">No gate is set differently.</p>;
  const shown = all ? changes : changes.slice(0, FIRST);
  return (
    <div className="hx-diff-gates" tabIndex={0} role="region" aria-label="Gates changed between the two versions">
      <HTMLTable compact striped className="hx-full-width" aria-label={`Gates changed from v${from} to v${to}`} data-testid="changed-gates">
        <thead>
          <tr>
            <th scope="col">Gate</th>
            <th scope="col">In v{from} (A)</th>
            <th scope="col">In v{to} (B)</th>
          </tr>
        </thead>
        <tbody>
          {shown.map((c) => (
            <tr key={c.gate}>
              <td className="hx-mono">{c.gate}</td>
              <td>{describeGateSetting(c.before, parkedA)}</td>
              <td>{describeGateSetting(c.after, parkedB)}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      {!all && changes.length > FIRST && <Button variant="minimal" text={`Show all ${changes.length} changed gates`} onClick={() => setAll(true)} />}
    </div>
  );
}

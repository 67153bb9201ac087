// Gate states of the export: every set gate with its state, coupling and phase; the rest parked.
import { HTMLTable } from '@blueprintjs/core';
import type { BenchExportBody } from '@hexloom/contracts';
import { formatNumber } from '../../figures/utils/formatFigure.js';

/** One gate of the export. */
type GateSetting = BenchExportBody['gates'][number];

export type GateStatesTableProps = { gates: readonly GateSetting[]; parkedState: 'bar' | 'cross' };

const STATE_WORDS: Record<GateSetting['state'], string> = { bar: 'bar', cross: 'cross', split: 'split' };

/** One row per set gate; a line says which state the other gates are parked in. */
export function GateStatesTable({ gates, parkedState }: GateStatesTableProps) {
  return (
    <>
      <p className="hx-bench-note">Every gate not listed is parked in {parkedState}.</p>
      {gates.length > 0 && (
        <div className="hx-bench-scroll" tabIndex={0} role="region" aria-label="Gate states (scrolls)">
          <HTMLTable compact striped className="hx-bench-table" aria-label="Gate states">
            <thead>
              <tr>
                <th scope="col">Gate</th>
                <th scope="col">State</th>
                <th scope="col" className="hx-num">Power coupling κ</th>
                <th scope="col" className="hx-num">Phase (rad)</th>
                <th scope="col">Circuit</th>
              </tr>
            </thead>
            <tbody>
              {gates.map((g) => (
                <tr key={g.gate}>
                  <td className="hx-mono">{g.gate}</td>
                  <td>{STATE_WORDS[g.state]}</td>
                  <td className="hx-num">{g.kappa === undefined ? '—' : formatNumber(g.kappa)}</td>
                  <td className="hx-num">{g.phaseRad === undefined ? '—' : formatNumber(g.phaseRad)}</td>
                  <td>{g.circuit ?? '—'}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </div>
      )}
    </>
  );
}

// The gates whose errors move the worst mask margin most, in words.
import { HTMLTable } from '@blueprintjs/core';
import type { GateSensitivity } from '@hexloom/synth';
import { formatNumber } from '../../figures/utils/formatFigure.js';

export type GateSensitivityListProps = {
  sensitivities: readonly GateSensitivity[];
  /** Rows shown (largest first). */
  limit?: number;
};

/** "Gate g(0,0)ne · coupler error · −12.3 dB per rad", largest effect first. */
export function GateSensitivityList({ sensitivities, limit = 10 }: GateSensitivityListProps) {
  if (sensitivities.length === 0) return <p className="hx-muted">The configuration sets no gates, so there is nothing to rank.</p>;
  const rows = sensitivities.slice(0, limit);
  return (
    <HTMLTable compact striped aria-label="Gate sensitivities" data-testid="gate-sensitivities">
      <thead>
        <tr>
          <th scope="col">Gate</th>
          <th scope="col">Error</th>
          <th scope="col">Change of the worst margin</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((s) => (
          <tr key={`${s.gate}-${s.quantity}`}>
            <td className="hx-mono">{s.gate}</td>
            <td>{s.quantity === 'coupler' ? 'Coupler splitting error' : 'Phase error'}</td>
            <td>{formatNumber(s.dMarginPerRad, 3)} dB per rad</td>
          </tr>
        ))}
      </tbody>
    </HTMLTable>
  );
}

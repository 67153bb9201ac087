// The values of every trace at the cursor, in words and units ("W11 → E14: −3.21 dB at +2.000 GHz").
import { formatOffsetGhz, formatValue } from '../utils/formatValue.js';
import { nearestIndex } from '../utils/nearestIndex.js';
import type { TraceSeries } from '../utils/traceSeries.js';

type Props = { series: readonly TraceSeries[]; labels: readonly string[]; unit: string; cursorGhz: number | null; rfAxis: boolean; decimals: number };

/** A polite live region listing each trace's nearest sample to the cursor; a hint when the pointer is away. */
export function CursorReadout({ series, labels, unit, cursorGhz, rfAxis, decimals }: Props) {
  return (
    <div className="hx-rp-readout" aria-live="polite" data-testid="cursor-readout">
      {cursorGhz === null ? (
        <span className="hx-muted">Point at the plot to read the values; drag across it to zoom into a band, double-click to see the whole span.</span>
      ) : (
        <ul>
          {series.map((s, i) => {
            const k = nearestIndex(s.xGhz, cursorGhz);
            const at = s.xGhz[k] ?? cursorGhz;
            const where = rfAxis ? `at an RF tone of ${formatValue(at, 'GHz', 3)}` : `at ${formatOffsetGhz(at)} from the carrier`;
            return (
              <li key={i}>
                <span className={`hx-rp-swatch hx-rp-swatch-${i % 6}`} aria-hidden="true" />
                {labels[i]}: {formatValue(s.y[k], unit, decimals)} {where}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}

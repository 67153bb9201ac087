// The residual figures of a comparison (measured minus simulated), in words and units.
import type { Comparison } from '@hexloom/contracts';
import { formatFrequencyHz, formatNumber } from '../../figures/utils/formatFigure.js';

export type ResidualFiguresProps = { figures: Comparison['figures'] };

/** A signed offset from the carrier, e.g. "+2.5 GHz" or "−1 GHz". */
const offset = (hz: number): string => (hz > 0 ? `+${formatFrequencyHz(hz)}` : formatFrequencyHz(hz));

/** RMS, mean (bias) and largest residual with where it occurs, and the number of points compared. */
export function ResidualFigures({ figures }: ResidualFiguresProps) {
  const rows: [string, string][] = [
    ['RMS residual', `${formatNumber(figures.rmsResidualDb)} dB`],
    ['Mean residual (measured above simulated when positive)', `${formatNumber(figures.meanResidualDb)} dB`],
    ['Largest residual', `${formatNumber(figures.maxAbsResidualDb)} dB at ${offset(figures.worstOffsetHz)} from the carrier`],
    ['Points compared', formatNumber(figures.points)],
  ];
  return (
    <dl className="hx-measured-figures" aria-label="Residual figures">
      {rows.map(([label, value]) => (
        <div key={label}>
          <dt>{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

// Bins the worst mask margin of every run for the histogram (d3's bin with "nice" thresholds).
import { bin, extent } from 'd3';

/** One bar: runs whose worst margin lies in [x0Db, x1Db). */
export type MarginBin = { x0Db: number; x1Db: number; count: number };

/**
 * About `binCount` bins of equal width covering every margin; the bin edges fall on round numbers and, when the
 * margins straddle it, one edge is 0 dB (the pass/fail boundary), so no bar mixes passing and failing runs.
 */
export function marginHistogram(marginsDb: readonly number[], binCount = 20): MarginBin[] {
  const values = marginsDb.filter(Number.isFinite);
  if (values.length === 0) return [];
  const [lo = 0, hi = 0] = extent(values);
  if (lo === hi) return [{ x0Db: lo - 0.5, x1Db: hi + 0.5, count: values.length }];
  const bins = bin().domain([lo, hi]).thresholds(binCount)(values);
  return bins.map((b) => ({ x0Db: b.x0 ?? lo, x1Db: b.x1 ?? hi, count: b.length }));
}

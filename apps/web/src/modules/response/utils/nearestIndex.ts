// The sample of an increasing axis nearest to a value (for the cursor read-out).
import { bisector } from 'd3';

const byValue = bisector((x: number) => x).center;

/** Index of the element of the increasing array `xs` nearest to `x`, or -1 when `xs` is empty. */
export function nearestIndex(xs: readonly number[], x: number): number {
  return xs.length === 0 ? -1 : byValue(xs, x);
}

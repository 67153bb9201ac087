// Numerical derivative of a sampled curve: central differences inside, one-sided at the ends.

/**
 * dy/dx at every sample: (y[i+1] - y[i-1]) / (x[i+1] - x[i-1]) inside, one-sided differences at both ends
 * (common practice); null where a neighbour is null or the step is zero.
 */
export function derivative(xs: readonly number[], ys: readonly (number | null)[]): (number | null)[] {
  const n = xs.length;
  return xs.map((_, i) => {
    const a = Math.max(0, i - 1), b = Math.min(n - 1, i + 1);
    const ya = ys[a], yb = ys[b], xa = xs[a], xb = xs[b];
    if (ya == null || yb == null || xa === undefined || xb === undefined || xb === xa) return null;
    return (yb - ya) / (xb - xa);
  });
}

/** Derivative-free minimisation by the Nelder–Mead simplex method (deterministic start, bounded iterations). */

export type MinimiseResult = { x: number[]; value: number; iterations: number };

/**
 * Minimises f from x0 with the standard reflection/expansion/contraction/shrink coefficients
 * (1, 2, 0.5, 0.5) of Nelder & Mead, Computer Journal 7(4), 1965.
 */
export function nelderMead(f: (x: number[]) => number, x0: number[], options: { step?: number; maxIterations?: number; tolerance?: number } = {}): MinimiseResult {
  const step = options.step ?? 0.1;
  const maxIterations = options.maxIterations ?? 2000;
  const tolerance = options.tolerance ?? 1e-12;
  const n = x0.length;
  let simplex = [x0, ...x0.map((_, i) => x0.map((v, j) => (i === j ? v + step : v)))].map((x) => ({ x, v: f(x) }));
  let iterations = 0;
  const combine = (a: number[], b: number[], t: number): number[] => a.map((v, i) => v + t * ((b[i] as number) - v));
  for (; iterations < maxIterations; iterations++) {
    simplex.sort((p, q) => p.v - q.v);
    const best = simplex[0] as { x: number[]; v: number };
    const worst = simplex[n] as { x: number[]; v: number };
    if (Math.abs(worst.v - best.v) <= tolerance * (Math.abs(best.v) + tolerance)) break;
    const centroid = x0.map((_, i) => simplex.slice(0, n).reduce((s, p) => s + (p.x[i] as number), 0) / n);
    const reflected = combine(centroid, worst.x, -1);
    const fr = f(reflected);
    if (fr < best.v) {
      const expanded = combine(centroid, worst.x, -2);
      const fe = f(expanded);
      simplex[n] = fe < fr ? { x: expanded, v: fe } : { x: reflected, v: fr };
    } else if (fr < (simplex[n - 1] as { v: number }).v) {
      simplex[n] = { x: reflected, v: fr };
    } else {
      const contracted = combine(centroid, worst.x, 0.5);
      const fc = f(contracted);
      if (fc < worst.v) simplex[n] = { x: contracted, v: fc };
      else simplex = simplex.map((p, k) => (k === 0 ? p : { x: combine(best.x, p.x, 0.5), v: f(combine(best.x, p.x, 0.5)) }));
    }
  }
  simplex.sort((p, q) => p.v - q.v);
  const top = simplex[0] as { x: number[]; v: number };
  return { x: top.x, value: top.v, iterations };
}

// Seeded streams per run and Monte Carlo chunks: normal deviates, independence of runs, and results that ignore the split.
import { describe, expect, it } from 'vitest';
import { planMonteCarlo, randomStream, runMonteCarloChunk, summariseMonteCarlo, type MonteCarloRun, type RandomStream } from './index.js';

const meanOf = (xs: readonly number[]): number => xs.reduce((s, x) => s + x, 0) / xs.length;
const varianceOf = (xs: readonly number[]): number => {
  const m = meanOf(xs);
  return xs.reduce((s, x) => s + (x - m) ** 2, 0) / (xs.length - 1);
};
const correlationOf = (xs: readonly number[], ys: readonly number[]): number => {
  const mx = meanOf(xs);
  const my = meanOf(ys);
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < xs.length; i++) {
    const dx = (xs[i] as number) - mx;
    const dy = (ys[i] as number) - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  return sxy / Math.sqrt(sxx * syy);
};

describe('randomStream', () => {
  it('draws standard normal deviates: mean 0, variance 1, 95 % inside +/-1.96', () => {
    // Standard normal: P(|X| < 1.959964) = 0.95 (normal table, common practice).
    const random = randomStream(2026);
    const n = 40_000;
    const xs = Array.from({ length: n }, () => random.normal());
    expect(Math.abs(meanOf(xs))).toBeLessThan(4 / Math.sqrt(n));
    expect(Math.abs(varianceOf(xs) - 1)).toBeLessThan(4 * Math.sqrt(2 / n));
    const inside = xs.filter((x) => Math.abs(x) < 1.959964).length / n;
    expect(Math.abs(inside - 0.95)).toBeLessThan(4 * Math.sqrt((0.95 * 0.05) / n));
  });

  it('gives a run the same stream every time, and different runs and different seeds different streams', () => {
    const draws = (random: RandomStream): number[] => [random.uniform(), random.normal(), random.normal(), random.normal()];
    expect(draws(randomStream(5, 1))).toEqual(draws(randomStream(5, 1)));
    expect(randomStream(5, 1).uniform()).not.toBe(randomStream(5, 2).uniform());
    expect(randomStream(5, 1).uniform()).not.toBe(randomStream(6, 1).uniform());
    expect(randomStream(-5, 1).uniform()).not.toBe(randomStream(5, 1).uniform());
  });

  // Runs at the top of the 1 000 000-run range: a stream that had to be stepped to its run would not finish in time.
  const n = 10_000;
  const first = 990_000;
  const firstNormals = (seed: number): number[] => Array.from({ length: n + 1 }, (_, k) => randomStream(seed, first + k).normal());

  it('draws a standard normal first deviate in each of 10 000 runs near run 999 999', () => {
    // Mean within 4 standard errors, variance within 4 sqrt(2 / n) of 1 (normal sampling spreads, common practice).
    const xs = firstNormals(17);
    expect(Math.abs(meanOf(xs))).toBeLessThan(4 / Math.sqrt(xs.length));
    expect(Math.abs(varianceOf(xs) - 1)).toBeLessThan(4 * Math.sqrt(2 / xs.length));
  });

  it('draws uncorrelated deviates in neighbouring runs and for neighbouring seeds', () => {
    // The sample correlation of n independent pairs has standard deviation about 1 / sqrt(n); allow 4 of them (common practice).
    const xs = firstNormals(17);
    const tolerance = 4 / Math.sqrt(n);
    expect(Math.abs(correlationOf(xs.slice(0, n), xs.slice(1)))).toBeLessThan(tolerance);
    expect(Math.abs(correlationOf(xs, firstNormals(18)))).toBeLessThan(tolerance);
    const uniforms = Array.from({ length: n + 1 }, (_, k) => randomStream(17, k).uniform());
    expect(Math.abs(correlationOf(uniforms.slice(0, n), uniforms.slice(1)))).toBeLessThan(tolerance);
  });

  it('refuses a negative or fractional run index and a fractional seed', () => {
    expect(() => randomStream(1, -1)).toThrow(/runIndex must be a non-negative integer, got -1/);
    expect(() => randomStream(1, 0.5)).toThrow(/runIndex/);
    expect(() => randomStream(1.5, 0)).toThrow(/seed must be an integer, got 1.5/);
  });
});

describe('Monte Carlo chunks', () => {
  const trial = (random: RandomStream): MonteCarloRun => {
    const x = random.normal();
    return { pass: Math.abs(x) < 1, figures: { x } };
  };
  // Three normals and a uniform per run, so a run ends halfway through a Box–Muller pair.
  const wideTrial = (random: RandomStream, runIndex: number): MonteCarloRun => {
    const [a, b, c] = [random.normal(), random.normal(), random.normal()];
    return { pass: random.uniform() < 0.7, figures: { a, sum: a + b + c, runIndex } };
  };
  const study = (seed: number, chunkSize: number): MonteCarloRun[] => planMonteCarlo({ runs: 50, seed, chunkSize }).flatMap((c) => runMonteCarloChunk(c, wideTrial));

  it('give identical runs, yield and spreads for chunks of 1, 3, 7 and the whole study', () => {
    const whole = study(9, 50);
    expect(whole.map((r) => r.figures.runIndex)).toEqual(Array.from({ length: 50 }, (_, k) => k));
    for (const chunkSize of [1, 3, 7]) {
      const pieces = study(9, chunkSize);
      expect(pieces).toEqual(whole);
      expect(summariseMonteCarlo(pieces)).toEqual(summariseMonteCarlo(whole));
    }
  });

  it('give different runs for different seeds', () => {
    const a = study(9, 7).map((r) => r.figures.a);
    const b = study(10, 7).map((r) => r.figures.a);
    expect(a.filter((x, k) => x === b[k])).toEqual([]);
  });

  it('report progress after every run and reach the normal-table yield', () => {
    const progress: number[] = [];
    const chunks = planMonteCarlo({ runs: 1000, seed: 9, chunkSize: 128 });
    expect(chunks).toHaveLength(8);
    expect(chunks.map((c) => c.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(chunks.at(-1)).toMatchObject({ start: 896, count: 104 });
    const runs = chunks.flatMap((c) => runMonteCarloChunk(c, trial, (done) => progress.push(done)));
    expect(progress).toHaveLength(1000);
    expect(progress.slice(0, 3)).toEqual([1, 2, 3]);
    // Yield of |X| < 1 for a standard normal is 0.6827 (normal table, common practice); within 4 standard errors.
    const summary = summariseMonteCarlo(runs);
    expect(summary.runs).toBe(1000);
    expect(Math.abs(summary.yield - 0.6827)).toBeLessThan(4 * summary.yieldStdError);
  });

  it('refuses zero runs', () => {
    expect(() => planMonteCarlo({ runs: 0, seed: 1, chunkSize: 10 })).toThrow(/runs/);
  });
});

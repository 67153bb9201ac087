import { describe, expect, it } from 'vitest';
import { planMonteCarlo, randomStream, runMonteCarloChunk, summariseMonteCarlo } from './index.js';

describe('randomStream', () => {
  it('draws standard normal deviates: mean 0, variance 1, 95 % inside +/-1.96', () => {
    // Standard normal: P(|X| < 1.959964) = 0.95 (normal table, common practice).
    const random = randomStream(2026);
    const n = 40_000;
    const xs = Array.from({ length: n }, () => random.normal());
    const mean = xs.reduce((s, x) => s + x, 0) / n;
    const variance = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1);
    expect(Math.abs(mean)).toBeLessThan(4 / Math.sqrt(n));
    expect(Math.abs(variance - 1)).toBeLessThan(4 * Math.sqrt(2 / n));
    const inside = xs.filter((x) => Math.abs(x) < 1.959964).length / n;
    expect(Math.abs(inside - 0.95)).toBeLessThan(4 * Math.sqrt((0.95 * 0.05) / n));
  });
  it('gives different chunks different streams and the same chunk the same stream', () => {
    expect(randomStream(5, 1).uniform()).toBe(randomStream(5, 1).uniform());
    expect(randomStream(5, 1).uniform()).not.toBe(randomStream(5, 2).uniform());
  });
});

describe('Monte Carlo chunks', () => {
  const trial = (random: ReturnType<typeof randomStream>) => {
    const x = random.normal();
    return { pass: Math.abs(x) < 1, figures: { x } };
  };
  it('give the same summary whether run as one chunk or many, and report progress', () => {
    const whole = planMonteCarlo({ runs: 1000, seed: 9, chunkSize: 1000 }).flatMap((c) => runMonteCarloChunk(c, trial));
    const progress: number[] = [];
    const chunks = planMonteCarlo({ runs: 1000, seed: 9, chunkSize: 128 });
    expect(chunks).toHaveLength(8);
    const pieces = chunks.flatMap((c) => runMonteCarloChunk(c, trial, (done) => progress.push(done)));
    expect(progress).toHaveLength(1000);
    // Yield of |X| < 1 for a standard normal is 0.6827 (normal table, common practice); within 4 standard errors.
    const summary = summariseMonteCarlo(pieces);
    expect(Math.abs(summary.yield - 0.6827)).toBeLessThan(4 * summary.yieldStdError);
    expect(summariseMonteCarlo(whole).runs).toBe(1000);
  });
  it('refuses zero runs', () => {
    expect(() => planMonteCarlo({ runs: 0, seed: 1, chunkSize: 10 })).toThrow(/runs/);
  });
});

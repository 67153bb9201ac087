// unwrapPhase: a wrapped linear phase comes back as the straight line.
import { describe, expect, it } from 'vitest';
import { unwrapPhase } from './unwrapPhase.js';

describe('unwrapPhase', () => {
  it('recovers a steep linear phase from its values wrapped into (-pi, pi] (common practice: steps below pi)', () => {
    const truth = Array.from({ length: 200 }, (_, i) => -0.9 * i + 0.3);
    const wrapped = truth.map((p) => Math.atan2(Math.sin(p), Math.cos(p)));
    const sut = unwrapPhase(wrapped);
    sut.forEach((p, i) => expect(p).toBeCloseTo(truth[i] as number, 10));
  });

  it('leaves a continuous phase alone', () => {
    expect(unwrapPhase([0, 0.5, 1, 0.5])).toEqual([0, 0.5, 1, 0.5]);
  });
});

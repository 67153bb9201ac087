// derivative: central differences, exact for a parabola inside the grid.
import { describe, expect, it } from 'vitest';
import { derivative } from './derivative.js';

describe('derivative', () => {
  it('is exact for y = 3x^2 + 2x inside the grid (common practice: central differences are exact for quadratics)', () => {
    const xs = Array.from({ length: 11 }, (_, i) => -1 + 0.2 * i);
    const sut = derivative(xs, xs.map((x) => 3 * x * x + 2 * x));
    for (let i = 1; i < xs.length - 1; i++) expect(sut[i]).toBeCloseTo(6 * (xs[i] as number) + 2, 10);
  });

  it('answers null where a neighbour it needs is missing, and still steps over a missing middle sample', () => {
    expect(derivative([0, 1, 2], [0, null, 2])).toEqual([null, 1, null]);
  });
});

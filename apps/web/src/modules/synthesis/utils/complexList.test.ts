// Coefficients typed as text: real, complex and purely imaginary items, and unreadable ones.
import { describe, expect, it } from 'vitest';
import { complexList, complexListText } from './complexList.js';

describe('complexList', () => {
  it('reads real, complex and imaginary items', () => {
    expect(complexList('1, 0.5+0.2j, -0.3j, 2-i, 1e-1')).toEqual([
      { re: 1, im: 0 },
      { re: 0.5, im: 0.2 },
      { re: 0, im: -0.3 },
      { re: 2, im: -1 },
      { re: 0.1, im: 0 },
    ]);
  });

  it('marks an unreadable item with NaN', () => {
    const [bad] = complexList('abc');
    expect(Number.isNaN(bad?.re)).toBe(true);
  });

  it('writes back what it reads', () => {
    const values = [{ re: 1, im: 0 }, { re: 0.5, im: 0.2 }, { re: 0, im: -0.3 }, { re: -2, im: -1.5 }];
    expect(complexList(complexListText(values))).toEqual(values);
  });
});

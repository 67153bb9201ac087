// defaultComparison: which pair the Versions tab compares first.
import { describe, expect, it } from 'vitest';
import { defaultComparison } from './defaultComparison.js';

const versions = [1, 2, 4, 5].map((number) => ({ number }));

describe('defaultComparison', () => {
  it('compares the shown version with the newest older one', () => {
    expect(defaultComparison(versions, 4)).toEqual({ a: 2, b: 4 });
  });
  it('compares the first version with the next one when nothing is older', () => {
    expect(defaultComparison(versions, 1)).toEqual({ a: 1, b: 2 });
  });
  it('falls back to the two newest when the shown version is not listed', () => {
    expect(defaultComparison(versions, 9)).toEqual({ a: 4, b: 5 });
  });
  it('has no pair for a single version', () => {
    expect(defaultComparison([{ number: 1 }], 1)).toEqual({ a: undefined, b: undefined });
  });
});

// Typed GHz band offsets as a comment anchor in Hz, and the words for a bad band.
import { describe, expect, it } from 'vitest';
import { bandAnchor } from './bandAnchor.js';

describe('bandAnchor', () => {
  it('reads GHz (a comma as decimal point) into Hz offsets', () => {
    const result = bandAnchor('1,9', ' 2.1 ');
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const anchor = result.anchor as { fromHz: number; toHz: number };
    // 1 GHz = 1e9 Hz (SI prefix, common practice); tolerance for the binary float of 1.9 * 1e9.
    expect(anchor.fromHz).toBeCloseTo(1.9e9, -1);
    expect(anchor.toHz).toBeCloseTo(2.1e9, -1);
  });

  it('says what is wrong with an empty, unreadable or reversed band', () => {
    expect(bandAnchor('', '2')).toEqual({ ok: false, message: 'Type where the band starts, in GHz from the reference frequency' });
    expect(bandAnchor('1', 'two')).toEqual({ ok: false, message: 'Type where the band ends, in GHz from the reference frequency' });
    expect(bandAnchor('3', '2')).toEqual({ ok: false, message: 'The band must end at or above where it starts' });
  });
});

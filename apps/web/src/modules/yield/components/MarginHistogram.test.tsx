// The margin histogram: one bar per bin, every run counted once, bins labelled in dB and the 0 dB boundary drawn.
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { marginHistogram } from '../utils/marginHistogram.js';
import { MarginHistogram } from './MarginHistogram.js';

// A fixed fixture of 200 margins from -1.9 dB to +2.08 dB (invented), not evenly spread.
const MARGINS = Array.from({ length: 200 }, (_, i) => -1.9 + 0.02 * i * (i % 3 === 0 ? 1 : 0.99));

describe('marginHistogram', () => {
  it('counts every run exactly once over bins that tile the range (a histogram partitions its data: common practice)', () => {
    const bins = marginHistogram(MARGINS, 20);
    expect(bins.reduce((s, b) => s + b.count, 0)).toBe(MARGINS.length);
    for (let i = 1; i < bins.length; i++) expect(bins[i]!.x0Db).toBeCloseTo(bins[i - 1]!.x1Db, 12);
  });

  it('puts a bin edge on 0 dB so no bar mixes passing and failing runs', () => {
    const bins = marginHistogram(MARGINS, 20);
    expect(bins.some((b) => Math.abs(b.x0Db) < 1e-12)).toBe(true);
    for (const b of bins) {
      const inside = MARGINS.filter((m) => m >= b.x0Db && m < b.x1Db);
      expect(inside.every((m) => m >= 0) || inside.every((m) => m < 0)).toBe(true);
    }
  });

  it('gives one bin of all runs when every margin is the same', () => {
    expect(marginHistogram([0, 0, 0])).toEqual([{ x0Db: -0.5, x1Db: 0.5, count: 3 }]);
  });
});

describe('MarginHistogram', () => {
  it('draws one bar per bin whose counts sum to the runs, labels in dB and the pass/fail line', () => {
    render(<MarginHistogram marginsDb={MARGINS} />);
    const bins = marginHistogram(MARGINS, 20);
    const bars = screen.getAllByTestId('margin-bar');
    expect(bars).toHaveLength(bins.length);
    expect(bars.reduce((s, b) => s + Number(b.getAttribute('data-count')), 0)).toBe(200);
    expect(bars[0]?.querySelector('title')?.textContent).toMatch(/^−?[\d.]+ dB to −?[\d.]+ dB: \d+ runs?$/);
    expect(screen.getByTestId('pass-fail-line')).toBeTruthy();
    expect(screen.getByTestId('margin-histogram').textContent).toContain('0 dB');
  });
});

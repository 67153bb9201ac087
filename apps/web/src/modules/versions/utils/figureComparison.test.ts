// figureComparison: figures of two versions side by side, with the change B − A in words and units.
import { describe, expect, it } from 'vitest';
import { figureComparison } from './figureComparison.js';

describe('figureComparison', () => {
  it('gives each circuit of either version its rows, with signed changes, "no change", "new in B" and "not in B"', () => {
    const a = { notch: { insertionLossDb: 7.5, notchDepthDb: 19.5 }, tap: { insertionLossDb: 3 } };
    const b = { notch: { insertionLossDb: 6.25, notchDepthDb: 19.5, failedChecks: 1 }, bus: { insertionLossDb: 1 } };
    const sut = figureComparison(a, b, () => undefined);
    expect(sut.map((c) => c.circuitId)).toEqual(['notch', 'tap', 'bus']);
    const notch = sut[0]!.rows;
    expect(notch.find((r) => r.name === 'insertionLossDb')).toMatchObject({ before: '7.5 dB', after: '6.25 dB', change: '−1.25 dB', changed: true });
    expect(notch.find((r) => r.name === 'notchDepthDb')).toMatchObject({ change: 'no change', changed: false });
    expect(notch.find((r) => r.name === 'failedChecks')).toMatchObject({ before: '—', after: '1', change: 'new in B' });
    expect(sut[1]!.rows[0]).toMatchObject({ after: '—', change: 'not in B' });
  });
});

// CSV and Touchstone of a plotted connection read back with the solver's own readers.
import { readSpectrumCsv, readTouchstone } from '@hexloom/solver';
import { describe, expect, it } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { computeSpectra } from './computeSpectra.js';
import { spectrumCsv } from './spectrumCsv.js';
import { spectrumTouchstone } from './spectrumTouchstone.js';

const [spectrum] = computeSpectra({ content: ringNotchContent(), pairs: [{ from: 'in', to: 'out' }], grid: { kind: 'span', startOffsetHz: -5e9, stopOffsetHz: 5e9, points: 101 } });

describe('plot data exports', () => {
  it('writes a CSV whose frequencies and dB read back as plotted', () => {
    const sut = readSpectrumCsv(spectrumCsv(spectrum!));
    expect(sut.frequenciesHz.length).toBe(101);
    sut.amplitudeDb.forEach((db, i) => expect(db).toBeCloseTo(spectrum!.points.amplitudeDb[i] as number, 8));
  });

  it('writes a 2-port Touchstone file (IBIS Touchstone 1.1, N11 N21 N12 N22 order) with S21 = S12 = the response', () => {
    const text = spectrumTouchstone(spectrum!);
    expect(text).toMatch(/S11 and S22 not computed/);
    const sut = readTouchstone(text, { portCount: 2 });
    const k = 50 * 4;
    const mag = Math.hypot(sut.re[k + 2] as number, sut.im[k + 2] as number);
    expect(20 * Math.log10(mag)).toBeCloseTo(spectrum!.points.amplitudeDb[50] as number, 6);
    expect(sut.re[k + 1]).toBeCloseTo(sut.re[k + 2] as number, 12);
  });
});

// Spectrum CSV: writer columns, read-back, bench files with magnitude only, and line-numbered errors.
import { describe, expect, it } from 'vitest';
import { impulseResponse, readSpectrumCsv, SPECTRUM_CSV_COLUMNS, spectrumFromImpulse, writeSpectrumCsv } from '../src/index.js';
import { allPassRing } from './fixtures.js';

const T_U = 9.1063e-12;

describe('spectrum CSV', () => {
  const ir = impulseResponse(allPassRing(0.2, 0.25), 'in');
  const s = spectrumFromImpulse({ impulse: ir.outputs[0]!, grid: { kind: 'span', startOffsetHz: -5e9, stopOffsetHz: 5e9, points: 21 }, unitDelayS: T_U, referenceFrequencyHz: 193.4e12 });

  it('writes a header of the documented columns and one row per frequency', () => {
    const text = writeSpectrumCsv(s, ['from in to out']);
    const lines = text.trim().split('\n');
    expect(lines[0]).toBe('# from in to out');
    expect(lines[1]).toBe(SPECTRUM_CSV_COLUMNS.join(','));
    expect(lines.length).toBe(2 + 21);
  });

  it('reads back amplitude, phase and group delay', () => {
    const back = readSpectrumCsv(writeSpectrumCsv(s));
    back.frequenciesHz.forEach((f, i) => {
      expect(f).toBeCloseTo(193.4e12 + s.offsetsHz[i]!, 0);
      expect(back.amplitudeDb[i]!).toBeCloseTo(10 * Math.log10(s.re[i]! ** 2 + s.im[i]! ** 2), 9);
      expect(back.groupDelayS![i]!).toBeCloseTo(s.groupDelayS[i]!, 20);
    });
  });

  it('takes a bench file with frequency in GHz and magnitude only', () => {
    const m = readSpectrumCsv('# bench export\nFrequency_GHz,amplitude_db,temperature_c\n193400.001,-3.5,25\n193400.002,-3.6,25\n');
    expect(m.frequenciesHz[1]).toBeCloseTo(193400.002e9, 0);
    expect(m.phaseRad).toBeNull();
    expect([...m.amplitudeDb]).toEqual([-3.5, -3.6]);
  });

  it('names the line and the reason for malformed files', () => {
    expect(() => readSpectrumCsv('frequency_hz,amplitude_db\n1,-3\n2,abc\n')).toThrow(/csv line 3: column amplitude_db has "abc"/);
    expect(() => readSpectrumCsv('frequency_hz,amplitude_db\n1\n')).toThrow(/csv line 2: expected 2 cells, got 1/);
    expect(() => readSpectrumCsv('frequency_hz,phase_deg\n1,3\n')).toThrow(/line 1: the header needs amplitude_db, or re and im/);
    expect(() => readSpectrumCsv('amplitude_db\n-3\n')).toThrow(/frequency_hz or frequency_ghz/);
    expect(() => readSpectrumCsv('frequency_hz,amplitude_db\n2,-3\n1,-3\n')).toThrow(/line 3: frequencies must increase/);
  });
});

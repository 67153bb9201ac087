import { describe, expect, it } from 'vitest';
import { MeasurementRangeError } from './measurement-errors.js';
import { readMeasuredPoints } from './read-measured-points.js';

const F0 = 193.4e12;

describe('readMeasuredPoints', () => {
  it('reads a spectrum CSV given in GHz', () => {
    const sut = readMeasuredPoints('frequency_ghz,amplitude_db\n193400,-3\n193401,-4.5\n', 'a.csv', F0);
    expect(sut).toEqual({ format: 'csv', points: { frequencyHz: [193.4e12, 193.401e12], powerDb: [-3, -4.5] } });
  });

  it('takes S21 of a two-port Touchstone file as the power of from -> to', () => {
    // Touchstone 1.1, "# HZ S MA R 50": a 2-port record is f S11 S21 S12 S22 (IBIS Open Forum, Touchstone 1.1, network data).
    const text = '# HZ S MA R 50\n193.4e12 0.1 0 0.5 0 0.5 0 0.1 0\n193.41e12 0.1 0 0.25 0 0.25 0 0.1 0\n';
    const sut = readMeasuredPoints(text, 'b.s2p', F0);
    expect(sut.format).toBe('touchstone');
    // 20 log10(0.5) = -6.0206 dB and 20 log10(0.25) = -12.0412 dB (common practice).
    expect(sut.points.powerDb[0]).toBeCloseTo(-6.0206, 4);
    expect(sut.points.powerDb[1]).toBeCloseTo(-12.0412, 4);
  });

  it('takes S11 of a one-port file', () => {
    const sut = readMeasuredPoints('# HZ S RI R 50\n193.4e12 0.1 0\n193.5e12 0 0.01\n', 'c.s1p', F0);
    expect(sut.points.powerDb).toEqual([-20, -40]);
  });

  it('refuses frequencies far from the reference (GHz given as Hz), powers out of range and a single point', () => {
    expect(() => readMeasuredPoints('frequency_hz,amplitude_db\n1.5,-3\n2.5,-4\n', 'd.csv', F0)).toThrow(/point 1 is at 1.5 Hz/);
    expect(() => readMeasuredPoints('frequency_hz,amplitude_db\n193.4e12,-3\n193.41e12,400\n', 'e.csv', F0)).toThrow(/point 2 has power 400 dB/);
    expect(() => readMeasuredPoints('frequency_hz,amplitude_db\n193.4e12,-3\n', 'f.csv', F0)).toThrow(MeasurementRangeError);
  });
});

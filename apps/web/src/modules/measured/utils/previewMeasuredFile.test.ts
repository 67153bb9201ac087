// The browser-side reading of measured files: Touchstone S21, units, and the problems that stop an upload.
import { describe, expect, it } from 'vitest';
import { previewMeasuredFile } from './previewMeasuredFile.js';

const F0_HZ = 193.4e12;
/** A 2-port in RI at 193.40 and 193.41 THz; S21 = 0.5 then 0.1j (records N11 N21 N12 N22, Touchstone 1.1). */
const S2P = ['! invented bench sweep', '# GHZ S RI R 50', '193400 0 0 0.5 0 0.5 0 0 0', '193410 0 0 0 0.1 0 0.1 0 0', ''].join('\n');

describe('previewMeasuredFile', () => {
  it('reads |S21| of a Touchstone 2-port in dB with its detected unit, format and ports', () => {
    const check = previewMeasuredFile(S2P, 'sweep.s2p', S2P.length, F0_HZ);
    if (!check.ok) throw new Error(check.issues[0]?.reason);
    const { preview } = check;
    expect(preview.portCount).toBe(2);
    expect(preview.format).toBe('touchstone');
    // 20 log10(0.5) = -6.0206 dB and 20 log10(0.1) = -20 dB (power of a wave amplitude, common practice).
    expect(preview.firstRows[0]?.powerDb).toBeCloseTo(-6.0206, 3);
    expect(preview.firstRows[1]?.powerDb).toBeCloseTo(-20, 9);
    expect(preview.firstRows[1]?.frequencyHz).toBeCloseTo(193.41e12, 0);
    expect(Object.fromEntries(preview.detected.map((d) => [d.label, d.value]))).toMatchObject({ 'Frequency unit': 'GHz', 'Data format': 'real and imaginary', 'Reference impedance': '50 Ω' });
  });

  it('names the line of a Touchstone record that is not a number', () => {
    const bad = S2P.replace('193410 0 0 0 0.1', '193410 0 zero 0 0.1');
    expect(previewMeasuredFile(bad, 'sweep.s2p', bad.length, F0_HZ)).toEqual({ ok: false, issues: [{ line: 4, reason: '"zero" is not a number' }] });
  });

  it('refuses a frequency given in GHz under a frequency_hz header (far from the carrier)', () => {
    const text = 'frequency_hz,amplitude_db\n193400,-3\n193410,-3.1\n';
    const check = previewMeasuredFile(text, 'sweep.csv', text.length, F0_HZ);
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.issues[0]?.reason).toMatch(/^point 1 is at 193\.4 kHz, more than 20 THz from the chip's carrier/);
  });

  it('refuses a name that is neither .csv nor .sNp, and a file with one point', () => {
    expect(previewMeasuredFile('x', 'sweep.txt', 1, F0_HZ).ok).toBe(false);
    const one = 'frequency_hz,amplitude_db\n193.4e12,-3\n';
    expect(previewMeasuredFile(one, 'one.csv', one.length, F0_HZ)).toEqual({ ok: false, issues: [{ line: null, reason: 'only 1 point(s); at least 2 are needed' }] });
  });
});

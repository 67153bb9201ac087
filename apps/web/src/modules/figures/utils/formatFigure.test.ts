import { describe, expect, it } from 'vitest';
import { formatFigure, formatFrequencyHz, formatNumber } from './formatFigure.js';

describe('formatFigure', () => {
  it('writes catalogue figures in words with their unit, never the raw name or exponent notation', () => {
    expect(formatFigure('insertionLossDb', 17.9812, 'coupled-ring-bandpass')).toEqual({ name: 'insertionLossDb', label: 'Insertion loss at the pass-band peak', text: '17.98 dB' });
    expect(formatFigure('insertionLossDb', 17.9812).label).toBe('Insertion loss at the carrier');
    expect(formatFigure('bandwidth3dBHz', 1.291e9).text).toBe('1.291 GHz');
    expect(formatFigure('bandwidth3dBHz', 1.291e9).label).toBe('3 dB width of the pass band');
  });

  it('names the output port of a figure saved per output', () => {
    expect(formatFigure('delayAtCarrierPs@E09', 123.4).label).toBe('Group delay at the carrier (E09)');
  });

  it('splits an unknown camel-case name into words and takes the unit from its suffix', () => {
    expect(formatFigure('somethingNewHz', 2.5e6)).toMatchObject({ label: 'Something new hz', text: '2.5 MHz' });
  });

  it('keeps four significant digits and a real minus sign', () => {
    expect(formatNumber(-0.000123456)).toBe('−0.0001235');
    expect(formatFrequencyHz(193.4e12)).toBe('193.4 THz');
  });
});

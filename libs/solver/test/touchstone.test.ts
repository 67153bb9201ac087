// Touchstone writer and reader: layout rules of the IBIS Open Forum Touchstone 1.1 / 2.0 specification, round trips, errors.
import { describe, expect, it } from 'vitest';
import { readTouchstone, SpectrumFileError, writeTouchstone, type TouchstoneData } from '../src/index.js';

/** S_ij = (10 i + j + 1) / 100 * e^{j (i - j) 0.3}: every entry distinct, so any mix-up of order shows. */
function sample(portCount: number, frequencies: number[]): TouchstoneData {
  const n = portCount, re = new Float64Array(frequencies.length * n * n), im = new Float64Array(re.length);
  frequencies.forEach((_, f) => {
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
      const mag = (10 * i + j + 1 + f) / 100, ang = (i - j) * 0.3;
      re[(f * n + i) * n + j] = mag * Math.cos(ang);
      im[(f * n + i) * n + j] = mag * Math.sin(ang);
    }
  });
  return { portCount: n, frequenciesHz: Float64Array.from(frequencies), re, im, referenceOhm: 50 };
}

const dataLines = (text: string): string[] => text.split('\n').filter((l) => l !== '' && !/^[!#[]/.test(l));

describe('writeTouchstone', () => {
  it('writes the option line "# GHZ S MA R 50" and the 2-port order N11 N21 N12 N22', () => {
    // Touchstone 1.1 spec, "Option Line" and "2-port Network Data" (IBIS Open Forum).
    const text = writeTouchstone(sample(2, [1e9]), { comments: ['hexloom test'] });
    expect(text.split('\n')[1]).toBe('# GHZ S MA R 50');
    const cells = dataLines(text)[0]!.split(' ').map(Number);
    expect(cells[0]).toBe(1);
    // Magnitudes of N11, N21, N12, N22: (0+0+1), (10+0+1), (0+1+1), (10+1+1) / 100.
    expect([cells[1], cells[3], cells[5], cells[7]]).toEqual([0.01, 0.11, 0.02, 0.12]);
    expect(cells[4]).toBeCloseTo(0.3 * (180 / Math.PI), 9); // angle of S21 in degrees
  });

  it('starts every matrix row on a new line with at most four pairs for 3 and 6 ports', () => {
    // Touchstone 1.1 spec, "3-port and 4-port Network Data" and "5-port and above": row-major, <= 4 pairs per line.
    const three = dataLines(writeTouchstone(sample(3, [1e9, 2e9])));
    expect(three.length).toBe(6);
    expect(three[0]!.split(' ').length).toBe(7); // frequency + 3 pairs
    expect(three[1]!.split(' ').length).toBe(6);
    const six = dataLines(writeTouchstone(sample(6, [1e9])));
    expect(six.length).toBe(12); // each row of 6 pairs: 4 + 2
    expect(six.every((l, i) => l.split(' ').length <= (i === 0 ? 9 : 8))).toBe(true);
  });

  it('writes the version 2.0 keywords in the order the standard asks', () => {
    // Touchstone 2.0 spec: [Version] first, option line, [Number of Ports], [Two-Port Data Order] for 2-ports,
    // [Number of Frequencies], [Network Data], data, [End].
    const text = writeTouchstone(sample(2, [1e9, 2e9, 3e9]), { version: '2.0', format: 'RI' });
    const lines = text.trim().split('\n');
    expect(lines.slice(0, 6)).toEqual(['[Version] 2.0', '# GHZ S RI R 50', '[Number of Ports] 2', '[Two-Port Data Order] 21_12', '[Number of Frequencies] 3', '[Network Data]']);
    expect(lines.at(-1)).toBe('[End]');
  });

  it('refuses frequencies that do not increase', () => {
    expect(() => writeTouchstone(sample(1, [2e9, 1e9]))).toThrow(/increase strictly/);
  });

  it('refuses S values that are not finite, naming the value', () => {
    const data = sample(2, [1e9]);
    data.re[3] = Number.NaN;
    expect(() => writeTouchstone(data)).toThrow(/S values must be finite, got NaN \+ .*j at flat index 3/);
  });

  it('writes an exact zero in DB as the -400 dB floor, which the reader takes back as a magnitude of 1e-20', () => {
    // Touchstone 1.1 and 2.0 spec (IBIS Open Forum), "Option Line": DB is 20 log10 |S| and an angle in degrees, and
    // every network data entry is a number, so -Infinity is not allowed. The floor of -400 dB is Hexloom's choice.
    for (const version of ['1.1', '2.0'] as const) {
      const data = sample(2, [1e9, 2e9]);
      data.re[1] = 0; // S12 at 1 GHz
      data.im[1] = 0;
      const text = writeTouchstone(data, { version, format: 'DB' });
      expect(text).not.toMatch(/Infinity|NaN/);
      // Order N11 N21 N12 N22: the dB of N12 is the fifth number of the record.
      expect(dataLines(text)[0]!.split(' ')[5]).toBe('-400');
      const back = readTouchstone(text, { fileName: 'zero.s2p' });
      expect(Math.hypot(back.re[1]!, back.im[1]!)).toBeCloseTo(1e-20, 30); // 10^(-400/20)
      expect(Math.hypot(back.re[2]!, back.im[2]!)).toBeCloseTo(Math.hypot(data.re[2]!, data.im[2]!), 10);
    }
  });

  it('keeps the frequencies of a 1 kHz grid at a 193.4 THz carrier distinct and exact when written in GHz', () => {
    // Touchstone 1.1 and 2.0 spec (IBIS Open Forum), "Network Data": frequencies in strictly increasing order.
    // The grid sits half a step off the carrier, where 12 significant digits (1 kHz in GHz) round neighbours together.
    const frequencies = Array.from({ length: 201 }, (_, k) => 193.4e12 + 500 + k * 1e3);
    expect(new Set(frequencies.map((f) => (f / 1e9).toPrecision(12))).size).toBeLessThan(frequencies.length);
    for (const version of ['1.1', '2.0'] as const) {
      const back = readTouchstone(writeTouchstone(sample(1, frequencies), { version, frequencyUnit: 'GHZ' }), { fileName: 'fine.s1p' });
      expect(back.frequenciesHz.length).toBe(frequencies.length);
      back.frequenciesHz.forEach((f, i) => {
        expect(Math.abs(f - frequencies[i]!)).toBeLessThanOrEqual(1e-3);
        if (i > 0) expect(f).toBeGreaterThan(back.frequenciesHz[i - 1]!);
      });
    }
  });

  it('writes each frequency of an uneven fine grid to within a thousandth of its step', () => {
    const step = 1234.5678;
    const frequencies = Array.from({ length: 300 }, (_, k) => 193.4e12 + 0.37 * step + k * step + (k % 7) * 0.1 * step);
    const back = readTouchstone(writeTouchstone(sample(1, frequencies), { frequencyUnit: 'GHZ' }), { fileName: 'uneven.s1p' });
    back.frequenciesHz.forEach((f, i) => expect(Math.abs(f - frequencies[i]!)).toBeLessThanOrEqual(step / 1000));
  });

  it('refuses two frequencies that no 17-digit number in GHz can tell apart, and writes them in HZ', () => {
    // Adjacent doubles near 270 THz (0.03125 Hz apart) that divide by 1e9 to the same double (IEEE 754 rounding).
    const a = 2.7e14 + 0.03125, b = 2.7e14 + 0.0625;
    expect(a / 1e9).toBe(b / 1e9);
    expect(() => writeTouchstone(sample(1, [a, b]), { frequencyUnit: 'GHZ' })).toThrow(/270000000000000.03 and 270000000000000.06 Hz cannot be told apart in GHZ/);
    const back = readTouchstone(writeTouchstone(sample(1, [a, b]), { frequencyUnit: 'HZ' }), { fileName: 'close.s1p' });
    expect([...back.frequenciesHz]).toEqual([a, b]);
  });
});

describe('readTouchstone', () => {
  for (const version of ['1.1', '2.0'] as const) {
    for (const format of ['MA', 'DB', 'RI'] as const) {
      it(`reads back what the writer wrote, version ${version}, ${format}, 2 and 5 ports`, () => {
        for (const ports of [2, 5]) {
          const data = sample(ports, [1e9, 1.5e9, 2.25e9]);
          const back = readTouchstone(writeTouchstone(data, { version, format, frequencyUnit: 'MHZ' }), { fileName: `chip.s${ports}p` });
          expect(back.portCount).toBe(ports);
          expect(back.version).toBe(version);
          back.frequenciesHz.forEach((f, i) => expect(f).toBeCloseTo(data.frequenciesHz[i]!, 3));
          back.re.forEach((v, k) => {
            expect(v).toBeCloseTo(data.re[k]!, 10);
            expect(back.im[k]!).toBeCloseTo(data.im[k]!, 10);
          });
        }
      });
    }
  }

  it('takes the defaults GHZ S MA R 50 when the option line is bare, and ignores comments', () => {
    // Touchstone 1.1: "#" alone means GHZ S MA R 50.
    const f = readTouchstone('! bench run 7\n#\n1 0.5 90 ! trailing comment\n2 0.25 -90\n', { fileName: 'x.s1p' });
    expect([...f.frequenciesHz]).toEqual([1e9, 2e9]);
    expect(f.im[0]).toBeCloseTo(0.5, 14);
    expect(f.im[1]).toBeCloseTo(-0.25, 14);
    expect(f.referenceOhm).toBe(50);
  });

  it('names the line and the reason for malformed files', () => {
    const read = (text: string, fileName = 'm.s2p') => () => readTouchstone(text, { fileName });
    expect(read('# GHZ S MA R 50\n1 0.1 0 0.2 0 0.3 0 0.4 0\n2 0.1 x 0.2 0 0.3 0 0.4 0\n')).toThrow(/touchstone line 3: "x" is not a number/);
    expect(read('# GHZ S MA R 50\n1 0.1 0 0.2 0 0.3 0\n')).toThrow(/line 2: incomplete record: 2-port data needs 9 numbers/);
    expect(read('# GHZ Z MA R 50\n1 0.1 0\n', 'm.s1p')).toThrow(/line 1: only S-parameters/);
    expect(read('# GHZ S MA R 50\n2 0.1 0\n1 0.1 0\n', 'm.s1p')).toThrow(/line 3: frequency 1 does not increase/);
    expect(read('[Version] 2.0\n# GHZ S MA R 50\n[Number of Ports] 1\n[Network Data]\n1 0.1 0\n', 'noext')).toThrow(/missing \[End\]/);
    expect(read('# GHZ S MA R 50\n1 0.1 0\n', 'noext')).toThrow(SpectrumFileError);
  });
});

describe('writeTouchstone comments', () => {
  it('keeps a comment with a newline on one line, so it cannot add an option line (Touchstone 1.1: one option line)', () => {
    const text = writeTouchstone({ portCount: 1, frequenciesHz: Float64Array.of(1e9, 2e9), re: Float64Array.of(1, 1), im: Float64Array.of(0, 0), referenceOhm: 50 }, { format: 'RI', comments: ['chip "x"\n# HZ S DB R 1'] });
    expect(text.split('\n').filter((l) => l.startsWith('#'))).toEqual(['# GHZ S RI R 50']);
    expect(readTouchstone(text, { fileName: 'x.s1p' }).format).toBe('RI');
  });
});

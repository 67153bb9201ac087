// The solver against the all-pass and add-drop ring equations and the textbook MZI, on hand-built netlists.
import { describe, expect, it } from 'vitest';
import { amplitudeDb, impulseResponse, spectrumFromImpulse } from '../src/index.js';
import { addDropRing, allPassRing, mzi } from './fixtures.js';

const T_U = 9.1063e-12; // demo unit delay (650 um at n_g 4.2), s
const F0 = 193.4e12;
const respond = (netlist: ReturnType<typeof allPassRing>, from: string, to: number, points = 4096) => {
  const ir = impulseResponse(netlist, from);
  return spectrumFromImpulse({ impulse: ir.outputs[to]!, grid: { kind: 'fsr', points }, unitDelayS: T_U, referenceFrequencyHz: F0 });
};

describe('a six-unit all-pass ring', () => {
  const kappa = 0.1, lossDb = 0.25;
  const t = Math.sqrt(1 - kappa);
  const alpha = 10 ** (-lossDb / 20); // amplitude of one unit
  const a = alpha ** 6; // round-trip amplitude
  const s = respond(allPassRing(kappa, lossDb), 'in', 0);

  it('follows |(t - a e^{-j phi}) / (1 - t a e^{-j phi})|^2 against the round-trip phase', () => {
    // Yariv, Electron. Lett. 36(4) 2000, eq. (3); Rabus 2007 eq. (2.4). The bus traversal of the coupling
    // stage adds one unit of loss (alpha^2 in power).
    for (let i = 0; i < s.offsetsHz.length; i += 37) {
      const phi = 2 * Math.PI * s.offsetsHz[i]! * 6 * T_U;
      const expected = (alpha ** 2 * (a * a - 2 * a * t * Math.cos(phi) + t * t)) / (1 - 2 * a * t * Math.cos(phi) + (a * t) ** 2);
      expect(s.re[i]! ** 2 + s.im[i]! ** 2).toBeCloseTo(expected, 10);
    }
  });

  it('has its notches one ring FSR = 1/(6 T_u) apart, with depth (a - t)^2 / (1 - a t)^2', () => {
    // 6144 points (not a power of two: direct sum) put every resonance exactly on the grid.
    const fine = respond(allPassRing(kappa, lossDb), 'in', 0, 6144);
    expect(fine.method).toBe('direct-sum');
    const db = amplitudeDb(fine);
    const minima: number[] = [];
    const n = db.length;
    // The grid is periodic (one unit FSR), so neighbours wrap around.
    for (let i = 0; i < n; i++) if (db[i]! < db[(i + n - 1) % n]! && db[i]! < db[(i + 1) % n]!) minima.push(fine.offsetsHz[i]!);
    expect(minima.length).toBe(6); // six ring FSRs fit in one unit FSR
    for (let i = 1; i < minima.length; i++) expect((minima[i]! - minima[i - 1]!) * 6 * T_U).toBeCloseTo(1, 10);
    // Notch depth at resonance, Yariv 2000 (critical coupling when a = t).
    const centre = s.offsetsHz.indexOf(0);
    expect(s.re[centre]! ** 2 + s.im[centre]! ** 2).toBeCloseTo((alpha ** 2 * (a - t) ** 2) / (1 - a * t) ** 2, 10);
  });

  it('has the finesse pi sqrt(t a) / (1 - t a) within 1 %', () => {
    // Rabus 2007 eq. (2.19) (high-finesse approximation); FWHM measured on the notch 1 - |H|^2 by interpolation.
    const depth = (i: number): number => 1 - (s.re[i]! ** 2 + s.im[i]! ** 2) / alpha ** 2;
    const centre = s.offsetsHz.indexOf(0);
    const half = depth(centre) / 2;
    let i = centre;
    while (depth(i + 1) > half) i++;
    const frac = (depth(i) - half) / (depth(i) - depth(i + 1));
    const fwhmHz = 2 * (s.offsetsHz[i]! + frac * (s.offsetsHz[i + 1]! - s.offsetsHz[i]!));
    const finesse = 1 / (6 * T_U) / fwhmHz;
    expect(finesse / ((Math.PI * Math.sqrt(t * a)) / (1 - t * a))).toBeCloseTo(1, 2);
  });

  it('has the resonant group delay T_rt a (1 - t^2) / ((a - t)(1 - a t)), negative when under-coupled', () => {
    // Phase derivative of the all-pass transfer at resonance (Rabus 2007 sec. 2.1; Heebner et al., JOSA B 21(10) 2004).
    const centre = s.offsetsHz.indexOf(0);
    const ringDelay = (6 * T_U * a * (1 - t * t)) / ((a - t) * (1 - a * t));
    expect(t).toBeGreaterThan(a); // kappa 0.1 with 1.5 dB round trip: under-coupled
    expect(s.groupDelayS[centre]! / (T_U + ringDelay)).toBeCloseTo(1, 9);
    expect(s.groupDelayS[centre]!).toBeLessThan(0);
  });

  it('has the group delay of the all-pass phase at every frequency, and its dispersion', () => {
    // tau(phi)/T_rt = (a^2 - a t cos phi)/(a^2 - 2 a t cos phi + t^2) + (a t cos phi - a^2 t^2)/(1 - 2 a t cos phi + a^2 t^2):
    // minus the phase derivative of (t - a e^{-j phi})/(1 - t a e^{-j phi}) (Yariv 2000 eq. (3); Rabus 2007 sec. 2.1).
    // Dispersion D = -(f^2 / c) d tau / d f (common practice), d tau / d f by a central difference of the formula.
    const tauUnits = (phi: number): number => {
      const c = Math.cos(phi);
      return 1 + 6 * ((a * a - a * t * c) / (a * a - 2 * a * t * c + t * t) + (a * t * c - a * a * t * t) / (1 - 2 * a * t * c + a * a * t * t));
    };
    for (let i = 0; i < s.offsetsHz.length; i += 53) {
      const f = s.offsetsHz[i]!;
      const phi = 2 * Math.PI * f * 6 * T_U;
      expect(s.groupDelayS[i]! / T_U).toBeCloseTo(tauUnits(phi), 8);
      const df = 1e5;
      const dTauDf = ((tauUnits(2 * Math.PI * (f + df) * 6 * T_U) - tauUnits(2 * Math.PI * (f - df) * 6 * T_U)) * T_U) / (2 * df);
      const expectedD = (-((F0 + f) ** 2) / 299_792_458) * dTauDf * 1e3; // s/m -> ps/nm
      // Relative 1e-5, with an absolute floor of 1e-5 ps/nm where D crosses zero (at resonance and anti-resonance).
      expect(Math.abs(s.dispersionPsPerNm[i]! - expectedD)).toBeLessThan(1e-5 * (Math.abs(expectedD) + 1));
    }
  });

  it('has a positive resonant group delay when over-coupled', () => {
    const over = respond(allPassRing(0.5, lossDb), 'in', 0);
    const tOver = Math.sqrt(0.5);
    const centre = over.offsetsHz.indexOf(0);
    expect(a).toBeGreaterThan(tOver);
    const ringDelay = (6 * T_U * a * (1 - tOver * tOver)) / ((a - tOver) * (1 - a * tOver));
    expect(over.groupDelayS[centre]! / (T_U + ringDelay)).toBeCloseTo(1, 9);
    expect(over.groupDelayS[centre]!).toBeGreaterThan(0);
  });
});

describe('a six-unit add-drop ring', () => {
  const k1 = 0.2, k2 = 0.15, lossDb = 0.1;
  const t1 = Math.sqrt(1 - k1), t2 = Math.sqrt(1 - k2);
  const alpha = 10 ** (-lossDb / 20);
  const a = alpha ** 6;
  const net = addDropRing(k1, k2, lossDb);
  const through = respond(net, 'in', 0), drop = respond(net, 'in', 1);

  it('follows the through and drop equations', () => {
    // Rabus 2007 eqs. (2.7) and (2.8): through (t1 - t2 a e^{-j phi})/(1 - t1 t2 a e^{-j phi}),
    // drop -k1 k2 sqrt(a) e^{-j phi/2}/(1 - t1 t2 a e^{-j phi}); each coupling stage's bus traversal adds alpha.
    for (let i = 0; i < through.offsetsHz.length; i += 41) {
      const phi = 2 * Math.PI * through.offsetsHz[i]! * 6 * T_U;
      const den = 1 - 2 * t1 * t2 * a * Math.cos(phi) + (t1 * t2 * a) ** 2;
      const thr = (alpha ** 2 * (t2 * t2 * a * a - 2 * t1 * t2 * a * Math.cos(phi) + t1 * t1)) / den;
      const drp = (alpha ** 2 * k1 * k2 * a) / den;
      expect(through.re[i]! ** 2 + through.im[i]! ** 2).toBeCloseTo(thr, 10);
      expect(drop.re[i]! ** 2 + drop.im[i]! ** 2).toBeCloseTo(drp, 10);
    }
  });
});

describe('a Mach-Zehnder stage with a two-unit arm difference', () => {
  it('has a cos^2 response with FSR 1/(2 T_u)', () => {
    // Textbook MZI: |H_cross|^2 = cos^2(w dL / 2) with dL = 2 units (e.g. Madsen & Zhao 1999, sec. 3.3).
    const net = mzi(3, 1, 0);
    const ir = impulseResponse(net, 'in');
    const cross = spectrumFromImpulse({ impulse: ir.outputs[1]!, grid: { kind: 'fsr', points: 256 }, unitDelayS: T_U, referenceFrequencyHz: F0 });
    const bar = spectrumFromImpulse({ impulse: ir.outputs[0]!, grid: { kind: 'fsr', points: 256 }, unitDelayS: T_U, referenceFrequencyHz: F0 });
    cross.offsetsHz.forEach((f, i) => {
      expect(cross.re[i]! ** 2 + cross.im[i]! ** 2).toBeCloseTo(Math.cos(2 * Math.PI * f * T_U) ** 2, 12);
      expect(bar.re[i]! ** 2 + bar.im[i]! ** 2).toBeCloseTo(Math.sin(2 * Math.PI * f * T_U) ** 2, 12);
    });
    // Period check: the response at f and f + 1/(2 T_u) agree (grid index shift of 128 of 256).
    expect(cross.re[10]! ** 2 + cross.im[10]! ** 2).toBeCloseTo(cross.re[138]! ** 2 + cross.im[138]! ** 2, 12);
  });
});

import { describe, expect, it } from 'vitest';
import { cAbs, cSub, polyOnCircle, type Complex } from './complex.js';
import { designFirTarget, kaiserBeta, besselI0 } from './fir-window-design.js';
import { latticeResponse } from './lattice-response.js';
import { peelLattice } from './layer-peeling.js';
import { complementarityError, complementaryPolynomial } from './spectral-factor.js';

/** A small seeded generator (mulberry32, common practice) so the random lattices are repeatable. */
function seeded(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let x = Math.imul(t ^ (t >>> 15), 1 | t);
    x ^= x + Math.imul(x ^ (x >>> 7), 61 | x);
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

const maxDifference = (x: Complex[], y: Complex[]): number => Math.max(...x.map((v, i) => cAbs(cSub(v, y[i] as Complex))));

describe('latticeResponse', () => {
  it('is lossless: |A|^2 + |B|^2 = 1 at every frequency', () => {
    // A lattice of lossless couplers and delays is paraunitary (Madsen & Zhao 1999, sec. 4.5).
    const { a, b } = latticeResponse({ couplerAnglesRad: [0.3, 1.1, 0.7, 0.2], stagePhasesRad: [0.5, -1.2, 2.0], globalPhaseRad: 0.4 });
    expect(complementarityError(a, b)).toBeLessThan(1e-13);
  });

  it('reduces to the textbook MZI: |A|^2 = cos^2(w/2) for two 3 dB couplers', () => {
    // Balanced-coupler MZI with unit delay difference, |H_bar|^2 = sin^2 or cos^2 of half the phase (common practice).
    const { a } = latticeResponse({ couplerAnglesRad: [Math.PI / 4, Math.PI / 4], stagePhasesRad: [0], globalPhaseRad: 0 });
    for (const w of [0, 0.7, 1.9, Math.PI]) expect(cAbs(polyOnCircle(a, w)) ** 2).toBeCloseTo(Math.sin(w / 2) ** 2, 12);
  });
});

describe('peelLattice', () => {
  it('recovers a lattice with the same response from random paraunitary pairs', () => {
    // Round trip of layer peeling (Jinguji & Kawachi, JLT 13(1), 1995): forward(peel(A, B)) = (A, B).
    const random = seeded(7);
    for (let trial = 0; trial < 20; trial++) {
      const order = 1 + Math.floor(random() * 8);
      const parameters = {
        couplerAnglesRad: Array.from({ length: order + 1 }, () => (random() - 0.5) * Math.PI),
        stagePhasesRad: Array.from({ length: order }, () => (random() - 0.5) * 2 * Math.PI),
        globalPhaseRad: random() * 2 * Math.PI,
      };
      const target = latticeResponse(parameters);
      const again = latticeResponse(peelLattice(target.a, target.b));
      expect(maxDifference(again.a, target.a)).toBeLessThan(1e-10);
      expect(maxDifference(again.b, target.b)).toBeLessThan(1e-10);
    }
  });

  it('realises a windowed band-pass target from A alone, reproducing |A|^2 to 1e-9', () => {
    const a = designFirTarget({ band: 'band-pass', order: 8, centreFraction: 0.2, widthFraction: 0.3, rejectionDb: 40 });
    const b = complementaryPolynomial(a);
    expect(complementarityError(a, b, 512)).toBeLessThan(1e-9);
    const realised = latticeResponse(peelLattice(a));
    for (let k = 0; k < 200; k++) {
      const w = (2 * Math.PI * k) / 200;
      expect(Math.abs(cAbs(polyOnCircle(realised.a, w)) ** 2 - cAbs(polyOnCircle(a, w)) ** 2)).toBeLessThan(1e-9);
    }
  });
});

describe('designFirTarget', () => {
  it('uses the published Kaiser beta and the I0 series', () => {
    // Oppenheim & Schafer sec. 7.6, Kaiser design formulas: A = 60 dB -> beta = 0.1102 * 51.3 = 5.6533; I0(1) = 1.2660658777 (Abramowitz & Stegun table 9.8; from memory).
    expect(kaiserBeta(60)).toBeCloseTo(5.65326, 5);
    expect(besselI0(1)).toBeCloseTo(1.2660658777, 9);
  });
  it('passes the band and rejects outside it', () => {
    const a = designFirTarget({ band: 'band-pass', order: 16, centreFraction: 0, widthFraction: 0.4, rejectionDb: 50 });
    const powerAt = (fraction: number): number => cAbs(polyOnCircle(a, 2 * Math.PI * fraction)) ** 2;
    expect(powerAt(0)).toBeGreaterThan(0.99);
    expect(10 * Math.log10(powerAt(0.45))).toBeLessThan(-40);
  });
});

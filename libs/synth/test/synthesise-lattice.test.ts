import { describe, expect, it } from 'vitest';
import { checkConfiguration } from '@hexloom/mesh';
import { unitDelayS } from '@hexloom/solver';
import { cAbs, polyOnCircle } from '../src/complex.js';
import { synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

const T_U = unitDelayS({ unitLengthUm: 650, groupIndex: 4.2 });
const ok = (r: ReturnType<typeof synthesise>): SynthesisSuccess => {
  if (!r.ok) throw new Error(`${r.reason}: ${r.message}`);
  return r;
};

describe('synthesise a Mach–Zehnder lattice', () => {
  // An ideal chip (no loss, no leakage) shows whether couplers and phases realise the lattice exactly.
  const ideal = demoChip({ ...DEMO_TECHNOLOGY, lossPerGateDb: 0, bendLossDb: 0, extinctionDb: 200 });
  // Parked cells of an ideal chip are lossless loops holding ~1e-20 of leaked energy, so stop at 1e-16.
  const run = (c: ReturnType<typeof demoChip>, order: number) =>
    ok(
      synthesise({
        impulse: { energyTolerance: 1e-16 },
        mesh: c.mesh,
        configuration: c.configuration,
        circuitId: 'lat',
        spec: { schemaVersion: 1, name: 'lat', spec: { kind: 'mzi-lattice', from: c.west[3] as string, to: c.east[3] as string, band: 'band-pass', order, armDifferenceUnits: 2, centreOffsetHz: 8e9, widthHz: 15e9, rejectionDb: 30 }, mask: { regions: [] } },
      }),
    );

  it('reproduces the target |A|^2 to 1e-9 when simulated on an ideal chip', () => {
    const result = run(ideal, 4);
    expect(checkConfiguration(ideal.mesh, result.configuration).ok).toBe(true);
    if (result.design.kind !== 'mzi-lattice') throw new Error('wrong kind');
    const v = result.verification[0]!;
    // Layer peeling (Jinguji & Kawachi, JLT 13(1), 1995): the lattice realises |A(e^jw)|^2 exactly, w = 2 pi f 2 T_u.
    v.response.frequencyHz.forEach((f, i) => {
      const target = cAbs(polyOnCircle((result.design as { target: { re: number; im: number }[] }).target, 2 * Math.PI * f * 2 * T_U)) ** 2;
      const simulated = 10 ** ((v.response.powerDb[i] as number) / 10);
      expect(Math.abs(simulated - target)).toBeLessThan(1e-9);
    });
  });

  it('passes the band at the requested centre on the lossy demo chip, and fails a rejection its order cannot reach', () => {
    const c = demoChip();
    const result = run(c, 4);
    const v = result.verification[0]!;
    expect(Math.abs((v.figures.centreFrequencyHz as number) - 8e9)).toBeLessThan(3e9);
    // Kaiser: transition width (A - 8) / (2.285 * 2 pi * N) of the FSR (Oppenheim & Schafer sec. 7.6): for 30 dB at
    // order 4 it is 38 % of the 54.9 GHz FSR (21 GHz), wider than the 15 GHz band itself, so no pass band is left;
    // both bands need N >= 22 / (14.36 * 15 / 54.9) = 5.6, i.e. order 6.
    expect(result.verdict.pass).toBe(false);
    expect(result.verdict.failed[0]?.quantity).toMatch(/order 4 leaves no pass band for 30 dB; Kaiser's formula asks order 6 or more/);
  });
});

import { describe, expect, it } from 'vitest';
import { checkConfiguration } from '@hexloom/mesh';
import { synthesise, type SynthesisSuccess } from '../src/index.js';
import { demoChip, DEMO_TECHNOLOGY } from './demo-chip.js';

describe('synthesise an all-pass delay equaliser', () => {
  // A low-loss variant of the demo technology, so that the loss of the rings does not tilt the delay.
  const chip = demoChip({ ...DEMO_TECHNOLOGY, lossPerGateDb: 0.02, extinctionDb: 40 });
  const slopePsPerGHz = 4;
  const result = synthesise({
    mesh: chip.mesh,
    configuration: chip.configuration,
    circuitId: 'eq',
    spec: { schemaVersion: 1, name: 'eq', spec: { kind: 'allpass-equaliser', from: chip.west[4] as string, to: chip.east[4] as string, band: { fromHz: 1e9, toHz: 5e9 }, target: { slopePsPerGHz }, stages: 3 }, mask: { regions: [] } },
  }) as SynthesisSuccess;

  it('places three rings in series on one bus and passes the checker', () => {
    expect(result.ok, result.ok ? '' : (result as unknown as { message: string }).message).toBe(true);
    expect(result.circuit.couplers).toHaveLength(3);
    expect(result.tunings).toHaveLength(3);
    expect(checkConfiguration(chip.mesh, result.configuration).ok).toBe(true);
  });

  it('gives the band the requested delay slope on the whole-chip model', () => {
    // The summed all-pass delay sum_k T (1 - r_k^2) / (1 - 2 r_k cos(phi_k) + r_k^2) (Madsen & Zhao 1999, ch. 6)
    // fitted to a line; measured here on the simulated chip, relative to its mean over the band.
    const v = result.verification[0]!;
    const inBand = v.response.frequencyHz.flatMap((f, i) => (f >= 1e9 && f <= 5e9 ? [{ f, d: v.response.groupDelayPs[i] as number }] : []));
    const meanF = inBand.reduce((s, p) => s + p.f, 0) / inBand.length;
    const meanD = inBand.reduce((s, p) => s + p.d, 0) / inBand.length;
    const slope = inBand.reduce((s, p) => s + (p.f - meanF) * (p.d - meanD), 0) / inBand.reduce((s, p) => s + (p.f - meanF) ** 2, 0);
    expect(slope * 1e9).toBeGreaterThan(0.9 * slopePsPerGHz);
    expect(slope * 1e9).toBeLessThan(1.1 * slopePsPerGHz);
  });
});

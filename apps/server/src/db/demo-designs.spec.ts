// Every seeded demo design must meet its own spec on every output, re-synthesised from nothing as the seed does.
import { buildMesh, emptyConfiguration } from '@hexloom/mesh';
import { synthesise, type SynthesisSuccess } from '@hexloom/synth';
import { describe, expect, it } from 'vitest';
import { DEMO_SPECS, demoChipDefinition } from './demo-designs.js';

const definition = demoChipDefinition();
const mesh = buildMesh(definition);

describe('the seeded demo designs', () => {
  for (const d of DEMO_SPECS) {
    it(`re-synthesise "${d.spec.name}" and pass every mask and target check on every output`, () => {
      const sut = synthesise({ spec: d.spec, mesh, configuration: emptyConfiguration(definition, 'bar'), circuitId: d.circuitId });
      expect(sut.ok, sut.ok ? '' : sut.message).toBe(true);
      const result = sut as SynthesisSuccess;
      expect(result.verdict.failed).toEqual([]);
      expect(result.verdict.checkCount).toBeGreaterThan(0);
      for (const v of result.verification) expect(v.fromName).toMatch(/^W\d\d$/);
    }, 60_000);
  }

  it('give the delay set steps of 37.5 ps within one unit delay, and each output its delay within 5 ps', () => {
    const d = DEMO_SPECS.find((s) => s.spec.spec.kind === 'ttd-set')!;
    const result = synthesise({ spec: d.spec, mesh, configuration: emptyConfiguration(definition, 'bar'), circuitId: d.circuitId }) as SynthesisSuccess;
    // Unit delay T_u = n_g L_u / c = 4.2 x 650 um / c = 9.106 ps (common practice).
    const unitDelayPs = (4.2 * 650e-6 * 1e12) / 299_792_458;
    const delays = result.verification.map((v) => v.figures.delayAtCarrierPs as number);
    for (let k = 1; k < delays.length; k++) expect(Math.abs((delays[k] as number) - (delays[k - 1] as number) - 37.5)).toBeLessThan(unitDelayPs);
    for (const v of result.verification) expect(Math.abs(v.figures.delayErrorPs as number)).toBeLessThanOrEqual(5);
  }, 60_000);
});

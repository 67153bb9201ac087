// Runs the solver example (the one in libs/solver/README.md) and checks its headline figures.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { configurationSchema } from '@hexloom/contracts';
import { demoRingConfiguration, runRingNotchExample } from './ring-notch.js';

describe('the ring notch example', () => {
  const figures = runRingNotchExample();

  it('gives a ring FSR of one sixth of the unit FSR, about 18.3 GHz', () => {
    // FSR = 1/(L T_u) with L = 6 units, T_u = n_g L_u / c = 9.106 ps (common practice).
    expect(figures.ringFsrHz).toBeCloseTo(1 / (6 * 9.1063e-12), -7);
    expect(figures.unitFsrHz / figures.ringFsrHz).toBeCloseTo(6, 12);
  });

  it('shows a notch, converges, and accounts for all the light', () => {
    expect(figures.notchDepthDb).toBeLessThan(-1);
    expect(figures.residualEnergy).toBeLessThan(1e-24);
    expect(figures.delivered + figures.leakedToOtherPorts + figures.lost + figures.residualEnergy).toBeCloseTo(1, 12);
    expect(figures.leakedToOtherPorts).toBeGreaterThan(0); // 25 dB extinction: parked gates leak
  });

  it('builds a configuration valid under the configuration schema, like the committed one the CLI examples use', () => {
    expect(configurationSchema.safeParse(demoRingConfiguration()).success).toBe(true);
    const committed: unknown = JSON.parse(readFileSync(new URL('./ring-notch.configuration.json', import.meta.url), 'utf8'));
    const parsed = configurationSchema.parse(committed);
    expect(runRingNotchExample(parsed).ringFsrHz).toBeCloseTo(figures.ringFsrHz, 0);
  });
});

// The README example runs and gives the drive the formulas predict.
import { describe, expect, it } from 'vitest';
import { runReadmeExample } from './readme-example.js';

describe('the README example', () => {
  it('drives the calibrated heater with P_pi (pi - offset) / pi and writes a CSV', async () => {
    const sut = await runReadmeExample();
    // common practice: P = 22 mW * (pi - 0.2) / pi.
    expect(sut.drivePowerW).toBeCloseTo((0.022 * (Math.PI - 0.2)) / Math.PI, 12);
    expect(sut.csv).toMatch(/^# hexloom bench export, schema version 1\n/);
    expect(sut.totalPowerW).toBeGreaterThan(sut.drivePowerW);
  });
});

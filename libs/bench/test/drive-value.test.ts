// Drive values of a thermal phase shifter: phase = offset + pi P / P_pi, P = V^2 / R, I = V / R (common practice).
import { describe, expect, it } from 'vitest';
import { driveForPhase, wrapPhaseRad, type ShifterCalibration } from '../src/index.js';

const heater: ShifterCalibration = { gate: 'g(0,0)e', shifter: 'theta', offsetRad: 0, piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.08, maxVoltageV: 12 };

describe('driveForPhase', () => {
  it('needs P_pi for a pi shift, with V = sqrt(P R) and I = V / R', () => {
    const sut = driveForPhase(heater, Math.PI);
    // common practice: P = P_pi * pi / pi = 22 mW; V = sqrt(0.022 W * 1200 ohm) = 5.138 V; I = V / R = 4.282 mA.
    expect(sut.powerW).toBeCloseTo(0.022, 12);
    expect(sut.voltageV).toBeCloseTo(Math.sqrt(26.4), 12);
    expect(sut.currentA).toBeCloseTo(Math.sqrt(26.4) / 1200, 12);
    expect(sut.powerW).toBeCloseTo(sut.voltageV * sut.currentA, 12);
    expect(sut.violations).toEqual([]);
  });

  it('takes a negative phase modulo 2 pi, so the power is never negative', () => {
    // -pi/2 is the same phase as 3 pi / 2: P = 1.5 P_pi = 33 mW (common practice).
    expect(driveForPhase(heater, -Math.PI / 2).powerW).toBeCloseTo(0.033, 12);
    expect(driveForPhase(heater, -Math.PI / 2).targetPhaseRad).toBeCloseTo(1.5 * Math.PI, 12);
  });

  it('wraps around the offset: a target just below the offset needs almost a full 2 pi', () => {
    const sut = driveForPhase({ ...heater, offsetRad: 1 }, 0.5);
    expect(sut.targetPhaseRad).toBeCloseTo(2 * Math.PI - 0.5, 12);
    expect(sut.powerW).toBeCloseTo((0.022 * (2 * Math.PI - 0.5)) / Math.PI, 12);
  });

  it('needs no power when the target equals the offset modulo 2 pi', () => {
    expect(driveForPhase({ ...heater, offsetRad: 0.3 }, 0.3 + 4 * Math.PI).powerW).toBeCloseTo(0, 12);
  });

  it('lists each limit a drive exceeds with its value and limit', () => {
    const sut = driveForPhase({ ...heater, maxPowerW: 0.02, maxVoltageV: 5 }, Math.PI);
    expect(sut.violations.map((v) => [v.quantity, v.limit])).toEqual([
      ['power', 0.02],
      ['voltage', 5],
    ]);
    expect(sut.violations[0]?.value).toBeCloseTo(0.022, 12);
  });

  it('refuses a non-finite phase and names the shifter', () => {
    expect(() => driveForPhase(heater, Number.NaN)).toThrow(/g\(0,0\)e:theta.*NaN/);
  });
});

describe('wrapPhaseRad', () => {
  it('maps any real phase into [0, 2 pi)', () => {
    for (const x of [-7, -2 * Math.PI, -0.1, 0, 3, 2 * Math.PI, 13]) {
      const w = wrapPhaseRad(x);
      expect(w).toBeGreaterThanOrEqual(0);
      expect(w).toBeLessThan(2 * Math.PI);
      expect(Math.cos(w)).toBeCloseTo(Math.cos(x), 12);
      expect(Math.sin(w)).toBeCloseTo(Math.sin(x), 12);
    }
  });
});

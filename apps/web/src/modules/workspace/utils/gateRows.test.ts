import { describe, expect, it } from 'vitest';
import { SMALL_CONTENT, SMALL_GATES } from '../test/smallContent.js';
import { gateRows } from './gateRows.js';
import { setGateSetting } from './setGateSetting.js';

// Thermal phase shifter: phase = offset + pi P / P_pi, P = V^2 / R (common practice); kappa = cos^2(theta / 2), so a
// bar gate holds theta = pi and a cross gate theta = 0 (balanced MZI gate, common practice).
const P_PI_W = 0.022;
const R_OHM = 1200;

describe('gateRows', () => {
  it('drives a parked bar gate with P_pi on its coupler shifter and nothing on its outer phase', () => {
    const sut = gateRows(SMALL_CONTENT);
    expect(sut).toHaveLength(SMALL_GATES.length);
    const row = sut[0]!;
    expect(row.state).toBe('idle');
    expect(row.thetaRad).toBeCloseTo(Math.PI, 12);
    expect(row.powerW).toBeCloseTo(P_PI_W, 12);
    expect(row.thetaVoltageV).toBeCloseTo(Math.sqrt(P_PI_W * R_OHM), 9);
    expect(row.phiVoltageV).toBe(0);
    expect(row.source).toBe('nominal');
  });

  it('needs no power for a cross gate and half of P_pi for a 3 dB split', () => {
    const gate = SMALL_GATES[0]!;
    expect(gateRows(setGateSetting(SMALL_CONTENT, gate, { state: 'cross' }))[0]!.powerW).toBeCloseTo(0, 12);
    // kappa = 0.5 -> theta = pi / 2 -> P = P_pi / 2.
    const split = gateRows(setGateSetting(SMALL_CONTENT, gate, { state: 'split', kappa: 0.5 }))[0]!;
    expect(split.thetaRad).toBeCloseTo(Math.PI / 2, 12);
    expect(split.powerW).toBeCloseTo(P_PI_W / 2, 12);
  });

  it("takes the chip's calibration where a shifter has one, offset included, and flags a drive over its limit", () => {
    const gate = SMALL_GATES[0]!;
    const calibration = [{ gate, shifter: 'theta' as const, offsetRad: Math.PI / 2, piPowerW: 0.03, resistanceOhm: 1000, maxPowerW: 0.01, maxVoltageV: 9 }];
    const row = gateRows(SMALL_CONTENT, calibration)[0]!;
    // bar needs theta = pi: (pi - pi/2) / pi * 30 mW = 15 mW, over the 10 mW limit.
    expect(row.powerW).toBeCloseTo(0.015, 12);
    expect(row.source).toBe('calibration');
    expect(row.overLimit).toBe(true);
  });
});

/** Drive of one thermal phase shifter for a target phase: the least non-negative power modulo 2 pi. */
import { BenchInputError } from './bench-input-error.js';
import type { ShifterCalibration } from './shifter-calibration.js';

/** Heater drive for one shifter; `violations` lists the limits it exceeds (empty when within them). */
export type DriveValue = {
  readonly gate: string;
  readonly shifter: ShifterCalibration['shifter'];
  /** Phase the shifter must add above its offset, rad, in [0, 2 pi). */
  readonly targetPhaseRad: number;
  readonly powerW: number;
  readonly voltageV: number;
  readonly currentA: number;
  readonly violations: readonly DriveViolation[];
};

/** One limit a drive exceeds. */
export type DriveViolation = { readonly gate: string; readonly shifter: ShifterCalibration['shifter']; readonly quantity: 'power' | 'voltage'; readonly value: number; readonly limit: number };

const TWO_PI = 2 * Math.PI;

/** `x` modulo 2 pi in [0, 2 pi). */
export function wrapPhaseRad(x: number): number {
  const r = x - TWO_PI * Math.floor(x / TWO_PI);
  return r >= TWO_PI ? 0 : r;
}

/**
 * Drive for `phaseRad` on a shifter with phase = offset + pi P / P_pi and P = V^2 / R, I = V / R
 * (thermal phase shifter, common practice). Any phase modulo 2 pi is equivalent, so the smallest
 * non-negative power is P = P_pi ((phase - offset) mod 2 pi) / pi.
 * @throws BenchInputError for a non-finite phase.
 */
export function driveForPhase(calibration: ShifterCalibration, phaseRad: number): DriveValue {
  if (!Number.isFinite(phaseRad)) throw new BenchInputError(`bench: phase of ${calibration.gate}:${calibration.shifter} must be finite, got ${phaseRad}`);
  const delta = wrapPhaseRad(phaseRad - calibration.offsetRad);
  const powerW = (calibration.piPowerW * delta) / Math.PI;
  const voltageV = Math.sqrt(powerW * calibration.resistanceOhm);
  const currentA = voltageV / calibration.resistanceOhm;
  const violations: DriveViolation[] = [];
  const id = { gate: calibration.gate, shifter: calibration.shifter };
  if (powerW > calibration.maxPowerW) violations.push({ ...id, quantity: 'power', value: powerW, limit: calibration.maxPowerW });
  if (voltageV > calibration.maxVoltageV) violations.push({ ...id, quantity: 'voltage', value: voltageV, limit: calibration.maxVoltageV });
  return { ...id, targetPhaseRad: delta, powerW, voltageV, currentA, violations };
}

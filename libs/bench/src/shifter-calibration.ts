/** One calibrated thermal phase shifter, in SI units. */

/** Which phase shifter of a gate: `theta` (internal, sets kappa) or `phi` (outer phase). */
export type ShifterKind = 'theta' | 'phi';

/** Calibration of one phase shifter: phase = offsetRad + pi * P / piPowerW, P = V^2 / resistanceOhm. */
export type ShifterCalibration = {
  readonly gate: string;
  readonly shifter: ShifterKind;
  /** Phase at zero power, rad. */
  readonly offsetRad: number;
  /** Power for a pi phase shift, W. */
  readonly piPowerW: number;
  readonly resistanceOhm: number;
  /** Drive limits: heater power, W, and voltage, V. */
  readonly maxPowerW: number;
  readonly maxVoltageV: number;
};

/** Key of a shifter in maps: `g(0,0)e:theta`. */
export function shifterKey(gate: string, shifter: ShifterKind): string {
  return `${gate}:${shifter}`;
}

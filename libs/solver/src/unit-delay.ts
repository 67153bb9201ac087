/** Unit delay and unit FSR of a mesh: every gate plus its corner bend is one unit of length. */

/** Speed of light in vacuum, m/s (SI exact value, BIPM SI Brochure 2019). */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

export type UnitDelayInput = {
  /** Length of one gate plus its corner bend, micrometres. */
  unitLengthUm: number;
  /** Group index of the waveguide at the reference frequency. */
  groupIndex: number;
};

/** Error for a technology figure that cannot describe a real waveguide. */
export class SolverInputError extends Error {
  override readonly name = 'SolverInputError';
}

/**
 * Unit delay T_u = n_g * L_u / c, in seconds (group delay of a guided wave, common practice).
 * @throws SolverInputError when the length or the group index is not a positive finite number.
 */
export function unitDelayS({ unitLengthUm, groupIndex }: UnitDelayInput): number {
  if (!(Number.isFinite(unitLengthUm) && unitLengthUm > 0)) {
    throw new SolverInputError(`solver: unitLengthUm must be a positive number, got ${unitLengthUm}`);
  }
  if (!(Number.isFinite(groupIndex) && groupIndex >= 1)) {
    throw new SolverInputError(`solver: groupIndex must be a number >= 1, got ${groupIndex}`);
  }
  return (groupIndex * unitLengthUm * 1e-6) / SPEED_OF_LIGHT_M_PER_S;
}

/**
 * Free spectral range of a loop of `lengthUnits` units, in hertz: FSR = 1 / (L * T_u).
 * With `lengthUnits` = 1 this is the unit FSR, the period of every response of the chip.
 */
export function loopFsrHz(input: UnitDelayInput & { lengthUnits: number }): number {
  if (!(Number.isInteger(input.lengthUnits) && input.lengthUnits > 0)) {
    throw new SolverInputError(`solver: lengthUnits must be a positive integer, got ${input.lengthUnits}`);
  }
  return 1 / (input.lengthUnits * unitDelayS(input));
}

// One drive value beyond its limit, in words and units.
import { formatNumber } from '../../figures/utils/formatFigure.js';
import type { DriveViolationBody } from '../api/DriveLimitRequestError.js';
import { shifterName } from './shifterName.js';

/** The parts of a violation sentence: where, what, and value against limit. */
export type ViolationWords = { where: string; quantity: string; value: string; limit: string };

/** Power in mW, voltage in V (the server sends SI: W and V). */
const amount = (v: DriveViolationBody, x: number): string => (v.quantity === 'power' ? `${formatNumber(x * 1e3)} mW` : `${formatNumber(x)} V`);

/** E.g. { where: "Gate g(1,2)ne, internal phase θ", quantity: "Heater power", value: "65.2 mW", limit: "60 mW" }. */
export function describeViolation(v: DriveViolationBody): ViolationWords {
  return {
    where: `Gate ${v.gate}, ${shifterName(v.shifter)}`,
    quantity: v.quantity === 'power' ? 'Heater power' : 'Heater voltage',
    value: amount(v, v.value),
    limit: amount(v, v.limit),
  };
}

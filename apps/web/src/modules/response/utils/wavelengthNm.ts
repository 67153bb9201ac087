// Wavelength of an optical frequency, for the plot's optional wavelength axis.
import { SPEED_OF_LIGHT_M_PER_S } from '@hexloom/solver';

/** Vacuum wavelength, nm, of the optical frequency `frequencyHz` (lambda = c / f). */
export function wavelengthNm(frequencyHz: number): number {
  return (SPEED_OF_LIGHT_M_PER_S / frequencyHz) * 1e9;
}

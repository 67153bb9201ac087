/** Domain errors of the measurements feature. */
import { DomainError } from '../common/domain-error.js';

/** Measured values outside what a bench can give for this chip (e.g. GHz given as Hz). */
export class MeasurementRangeError extends DomainError {
  override readonly name = 'MeasurementRangeError';
  readonly kind = 'unprocessable';
  constructor(fileName: string, reason: string) {
    super(`Measured data in "${fileName}" is out of range: ${reason}`, [{ path: 'file', message: reason }]);
  }
}

/** Domain errors of the chips feature. */
import { DomainError } from '../common/domain-error.js';

/** A chip definition that the mesh library cannot build (bad port, gate or shape). */
export class InvalidChipError extends DomainError {
  override readonly name = 'InvalidChipError';
  readonly kind = 'unprocessable';
  constructor(reason: string) {
    super(`The chip definition cannot be built: ${reason}`);
  }
}

/** A calibration file with bad rows; `issues` name each line. */
export class InvalidCalibrationError extends DomainError {
  override readonly name = 'InvalidCalibrationError';
  readonly kind = 'unprocessable';
  constructor(message: string, issues: { line: number; column: string | null; reason: string }[]) {
    super(message, issues.map((i) => ({ path: `line ${i.line}${i.column ? `: ${i.column}` : ''}`, message: i.reason })));
  }
}

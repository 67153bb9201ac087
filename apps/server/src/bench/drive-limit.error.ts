/** The 422 of a bench export whose drive values exceed a limit: lists each shifter, with the cautions. */
import { BENCH_CAUTIONS, type DriveViolation } from '@hexloom/bench';
import { DomainError } from '../common/domain-error.js';

/** Some shifter would be driven beyond its power or voltage limit. */
export class DriveLimitError extends DomainError {
  override readonly name = 'DriveLimitError';
  readonly kind = 'unprocessable';
  constructor(violations: readonly DriveViolation[]) {
    const unit = (v: DriveViolation): string => (v.quantity === 'power' ? `${(v.value * 1e3).toFixed(2)} mW > ${(v.limit * 1e3).toFixed(2)} mW` : `${v.value.toFixed(3)} V > ${v.limit.toFixed(3)} V`);
    super(
      `${violations.length} drive value(s) exceed their limits: ${violations.map((v) => `${v.gate}:${v.shifter} ${v.quantity} ${unit(v)}`).join('; ')}`,
      violations.map((v) => ({ path: `${v.gate}:${v.shifter}`, message: `${v.quantity} ${unit(v)}` })),
      { violations, cautions: BENCH_CAUTIONS },
    );
  }
}

/** Domain errors of the compute routes. */
import { DomainError } from '../common/domain-error.js';

/** A port reference that is neither a port id nor a label of the chip. */
export class UnknownPortError extends DomainError {
  override readonly name = 'UnknownPortError';
  readonly kind = 'unprocessable';
  constructor(ref: string, field: string) {
    super(`"${ref}" is not a port id or label of this chip`, [{ path: field, message: 'unknown port' }]);
  }
}

/** A re-route without a request of a circuit that has no saved spec. */
export class NothingToRerouteError extends DomainError {
  override readonly name = 'NothingToRerouteError';
  readonly kind = 'unprocessable';
  constructor(circuitId: string, reason: string) {
    super(`Cannot re-route circuit "${circuitId}": ${reason}`);
  }
}

/** More running yield jobs, or open event streams, than a team or a user may have at once. */
export class TooManyJobsError extends DomainError {
  override readonly name = 'TooManyJobsError';
  readonly kind = 'too_many';
  constructor(message: string) {
    super(message);
  }
}

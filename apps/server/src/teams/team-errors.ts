/** Domain errors of the teams feature. */
import { DomainError } from '../common/domain-error.js';

/** The requested team slug belongs to another team. */
export class SlugTakenError extends DomainError {
  override readonly name = 'SlugTakenError';
  readonly kind = 'conflict';

  constructor(slug: string) {
    super(`Team slug "${slug}" is already taken`, [{ path: 'slug', message: 'already taken' }]);
  }
}

/** Domain errors of the reviews and comments feature. */
import { DomainError } from '../common/domain-error.js';

/** A named reviewer who cannot review this version (not a member, a viewer, or its author). */
export class InvalidReviewerError extends DomainError {
  override readonly name = 'InvalidReviewerError';
  readonly kind = 'unprocessable';
  constructor(login: string, reason: string) {
    super(`"${login}" cannot review this version: ${reason}`, [{ path: 'reviewers', message: `${login}: ${reason}` }]);
  }
}

/** The caller was not asked to review this version (only a named reviewer, never the author, decides). */
export class NotAReviewerError extends DomainError {
  override readonly name = 'NotAReviewerError';
  readonly kind = 'forbidden';
  constructor(login: string, versionNumber: number) {
    super(`"${login}" is not a named reviewer of version ${versionNumber}; ask for a review request first`);
  }
}

/** A comment whose parent or anchor does not belong to the version. */
export class InvalidCommentError extends DomainError {
  override readonly name = 'InvalidCommentError';
  readonly kind = 'unprocessable';
  constructor(path: string, message: string) {
    super(`Invalid comment: ${path}: ${message}`, [{ path, message }]);
  }
}

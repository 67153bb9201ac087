/** Domain error: the OAuth callback's state does not match the one this browser was given. */
import { DomainError } from '../common/domain-error.js';

/** Missing, expired or mismatching `state` on the callback (possible forged sign-in). */
export class OAuthStateMismatchError extends DomainError {
  override readonly name = 'OAuthStateMismatchError';
  readonly kind = 'invalid';

  constructor(reason: 'missing-cookie' | 'mismatch') {
    super(
      reason === 'missing-cookie'
        ? 'Sign-in state cookie is missing or expired; start the sign-in again'
        : 'Sign-in state does not match this browser; start the sign-in again',
      [{ path: 'state', message: reason }],
    );
  }
}

/** Domain errors of the fake identity provider. */
import { DomainError } from '../common/domain-error.js';

/** Why an authorization code was refused. */
export type CodeProblem = 'unknown' | 'used' | 'expired' | 'wrong-client';

/** An authorization code that cannot be exchanged for a token. */
export class AuthorizationCodeError extends DomainError {
  override readonly name = 'AuthorizationCodeError';
  readonly kind = 'invalid';

  constructor(
    readonly problem: CodeProblem,
    code: string,
  ) {
    super(`Authorization code "${code.slice(0, 8)}…" is ${problem === 'wrong-client' ? 'for another client or redirect' : problem}`, [
      { path: 'code', message: problem },
    ]);
  }
}

/** An authorize request for a client or redirect URI the provider does not know. */
export class UnknownClientError extends DomainError {
  override readonly name = 'UnknownClientError';
  readonly kind = 'invalid';

  constructor(field: 'client_id' | 'redirect_uri', value: string) {
    super(`Unknown ${field} "${value}"`, [{ path: field, message: 'not registered with the local provider' }]);
  }
}

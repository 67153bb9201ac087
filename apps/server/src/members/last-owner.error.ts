/** Domain error: a change that would leave a team without an owner. */
import { DomainError } from '../common/domain-error.js';

/** Refuses demoting or removing the only remaining owner of a team. */
export class LastOwnerError extends DomainError {
  override readonly name = 'LastOwnerError';
  readonly kind = 'conflict';

  constructor(login: string, teamId: string) {
    super(`"${login}" is the last owner of team "${teamId}"; make another member owner first`);
  }
}

/** Domain errors of the invitations feature. */
import { DomainError } from '../common/domain-error.js';

/** The invited e-mail already belongs to a member of the team. */
export class AlreadyMemberError extends DomainError {
  override readonly name = 'AlreadyMemberError';
  readonly kind = 'conflict';

  constructor(email: string) {
    super(`"${email}" is already a member of this team`, [{ path: 'email', message: 'already a member' }]);
  }
}

/** A pending invitation for the e-mail already exists in the team. */
export class InvitationPendingError extends DomainError {
  override readonly name = 'InvitationPendingError';
  readonly kind = 'conflict';

  constructor(email: string) {
    super(`"${email}" already has a pending invitation to this team`, [{ path: 'email', message: 'already invited' }]);
  }
}

/** An accepted invitation cannot be revoked (remove the member instead). */
export class InvitationAcceptedError extends DomainError {
  override readonly name = 'InvitationAcceptedError';
  readonly kind = 'conflict';

  constructor(invitationId: string) {
    super(`Invitation "${invitationId}" was already accepted; remove the member instead`);
  }
}

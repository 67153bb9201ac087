/** The express request as seen after the session guard and the team-roles guard ran. */
import type { TeamRole, User } from '@hexloom/contracts';
import type { Request } from 'express';

/** The signed-in user's role in the team named by `:teamId`. */
export type TeamAccess = { teamId: string; role: TeamRole };

/** Express request with what the guards attach. */
export type AuthedRequest = Omit<Request, 'user'> & {
  user?: User;
  sessionId?: string;
  teamAccess?: TeamAccess;
  oauthReturnTo?: string;
  /** The invitation token the sign-in started from (an invitation link). */
  oauthInvitation?: string;
};

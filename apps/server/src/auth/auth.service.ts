/** Sign-in bookkeeping: upsert the user, accept invitations, open and close sessions, audit. */
import { randomBytes } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { AuthProviderName, User } from '@hexloom/contracts';
import { AuditService } from '../audit/audit.service.js';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { DATABASE, type Database } from '../db/database.js';
import { users } from '../db/schema/index.js';
import { InvitationsService } from '../invitations/invitations.service.js';
import { LOCAL_IDP_CLIENT_ID } from '../local-idp/local-idp.service.js';
import type { OAuthProfile } from './oauth-profile.js';
import { SessionsService } from './sessions.service.js';

/** Both providers store users under provider `github`; the fake one's ids never collide. */
const USER_PROVIDER = 'github';

/** Orchestrates the sign-in flow around the identity provider. */
@Injectable()
export class AuthService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    @Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions,
    private readonly sessions: SessionsService,
    private readonly invitations: InvitationsService,
    private readonly audit: AuditService,
  ) {}

  /** `'github'` with credentials configured, else the built-in fake provider. */
  providerKind(): AuthProviderName {
    return this.options.github ? 'github' : 'local';
  }

  /** A fresh random `state` value. */
  newState(): string {
    return randomBytes(24).toString('base64url');
  }

  /** Where the browser goes to sign in at the provider. */
  authorizeUrl(state: string): string {
    const redirectUri = `${this.options.publicUrl}/api/auth/callback`;
    const github = this.options.github;
    const url = github
      ? new URL('https://github.com/login/oauth/authorize')
      : new URL(`${this.options.publicUrl}/api/local-idp/authorize`);
    url.searchParams.set('client_id', github ? github.clientId : LOCAL_IDP_CLIENT_ID);
    url.searchParams.set('redirect_uri', redirectUri);
    url.searchParams.set('scope', 'read:user user:email');
    url.searchParams.set('state', state);
    return url.toString();
  }

  /** Inserts or refreshes the user row for a provider profile. */
  async upsertUser(profile: OAuthProfile): Promise<User> {
    const values = {
      login: profile.login,
      name: profile.name,
      email: profile.email?.toLowerCase() ?? null,
      avatarUrl: profile.avatarUrl,
    };
    const [row] = await this.db
      .insert(users)
      .values({ provider: USER_PROVIDER, providerId: profile.providerId, ...values })
      .onConflictDoUpdate({ target: [users.provider, users.providerId], set: values })
      .returning();
    if (!row) throw new Error(`AuthService.upsertUser: no row for provider id "${profile.providerId}"`);
    return { id: row.id, login: row.login, name: row.name, email: row.email, avatarUrl: row.avatarUrl };
  }

  /**
   * Accepts the invitation of the link the sign-in started from (any account may), and, with the code-host sign-in
   * only, the pending invitations of the user's e-mail (the local sign-in lets anyone type any address); opens a
   * session, audits; returns the raw token.
   */
  async completeSignIn(user: User, invitationToken?: string): Promise<string> {
    return this.db.transaction(async (tx) => {
      const accepted = (invitationToken ? await this.invitations.acceptByToken(user, invitationToken, tx) : 0) + (this.options.github ? await this.invitations.acceptPendingFor(user, tx) : 0);
      const { token } = await this.sessions.create(user.id, tx);
      await this.audit.record(
        { action: 'auth.signed_in', teamId: null, actorId: user.id, target: user.login, detail: { provider: this.providerKind(), acceptedInvitations: accepted } },
        tx,
      );
      return token;
    });
  }

  /** Deletes the session behind `token` (if any) and audits the sign-out. */
  async signOut(token: string | undefined): Promise<void> {
    if (!token) return;
    const userId = await this.sessions.delete(token);
    if (userId) await this.audit.record({ action: 'auth.signed_out', teamId: null, actorId: userId, target: null });
  }
}

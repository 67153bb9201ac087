/** In-process state of the fake identity provider: single-use codes and bearer tokens. */
import { randomBytes } from 'node:crypto';
import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { DEMO_ACCOUNTS } from '../db/demo-accounts.js';
import { localProviderId } from '../db/local-provider-id.js';
import { AuthorizationCodeError, UnknownClientError } from './local-idp-errors.js';
import type { LocalIdpProfile } from './local-idp-profile.js';

/** The client id Hexloom registers with its own fake provider. */
export const LOCAL_IDP_CLIENT_ID = 'hexloom-local';

/** Codes live ten minutes, like the code host's. */
export const CODE_LIFETIME_MS = 10 * 60 * 1000;

/** Access tokens are only needed right after the exchange; one hour is plenty. */
const TOKEN_LIFETIME_MS = 60 * 60 * 1000;

/** An account chosen or typed on the authorize page. */
export type AccountChoice = { login: string; name?: string | undefined; email?: string | undefined };

type CodeRecord = { profile: LocalIdpProfile; clientId: string; redirectUri: string; expiresAtMs: number; used: boolean };

/** Issues codes on the authorize page, exchanges them for tokens, answers the user endpoint. */
@Injectable()
export class LocalIdpService {
  private readonly codes = new Map<string, CodeRecord>();
  private readonly tokens = new Map<string, { profile: LocalIdpProfile; expiresAtMs: number }>();

  constructor(@Inject(HEXLOOM_OPTIONS) private readonly options: ResolvedOptions) {}

  /** The only redirect URI registered for the local client. */
  callbackUrl(): string {
    return `${this.options.publicUrl}/api/auth/callback`;
  }

  /** Throws UnknownClientError unless the pair is the registered client and redirect. */
  assertClient(clientId: string, redirectUri: string): void {
    if (clientId !== LOCAL_IDP_CLIENT_ID) throw new UnknownClientError('client_id', clientId);
    if (redirectUri !== this.callbackUrl()) throw new UnknownClientError('redirect_uri', redirectUri);
  }

  /** Issues a single-use code for the chosen account; demo logins fill in their name and e-mail. */
  issueCode(choice: AccountChoice, clientId: string, redirectUri: string): string {
    this.assertClient(clientId, redirectUri);
    this.prune();
    const login = choice.login.toLowerCase();
    const demo = DEMO_ACCOUNTS.find((a) => a.login === login);
    const profile: LocalIdpProfile = {
      id: localProviderId(login),
      login,
      name: choice.name ?? demo?.name ?? login,
      email: choice.email ?? demo?.email ?? null,
      avatar_url: null,
    };
    const code = randomBytes(20).toString('hex');
    this.codes.set(code, { profile, clientId, redirectUri, expiresAtMs: Date.now() + CODE_LIFETIME_MS, used: false });
    return code;
  }

  /** Exchanges a code once for a bearer token. A reused code is refused (and stays refused). */
  exchangeCode(code: string, clientId: string, redirectUri?: string): string {
    const record = this.codes.get(code);
    if (!record) throw new AuthorizationCodeError('unknown', code);
    if (record.used) throw new AuthorizationCodeError('used', code);
    record.used = true;
    if (Date.now() > record.expiresAtMs) throw new AuthorizationCodeError('expired', code);
    if (clientId !== record.clientId || (redirectUri !== undefined && redirectUri !== record.redirectUri)) {
      throw new AuthorizationCodeError('wrong-client', code);
    }
    const token = randomBytes(20).toString('hex');
    this.tokens.set(token, { profile: record.profile, expiresAtMs: Date.now() + TOKEN_LIFETIME_MS });
    return token;
  }

  /** The profile behind a bearer token; 401 for an unknown or expired token. */
  userForToken(token: string): LocalIdpProfile {
    const entry = this.tokens.get(token);
    if (!entry || Date.now() > entry.expiresAtMs) throw new UnauthorizedException('Unknown or expired access token');
    return entry.profile;
  }

  private prune(): void {
    const nowMs = Date.now();
    for (const [code, record] of this.codes) {
      if (record.expiresAtMs + CODE_LIFETIME_MS < nowMs) this.codes.delete(code);
    }
    for (const [token, entry] of this.tokens) {
      if (entry.expiresAtMs < nowMs) this.tokens.delete(token);
    }
  }
}

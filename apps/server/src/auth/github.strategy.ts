/** passport-github2 strategy: the code host's OAuth web flow when credentials are configured. */
import { Inject, Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import type { User } from '@hexloom/contracts';
import GitHub from 'passport-github2';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { AuthService } from './auth.service.js';

/** Strategy name used by the callback guard when GitHub credentials are configured. */
export const GITHUB_STRATEGY = 'github';

type GithubProfile = {
  id: string;
  username?: string;
  displayName?: string;
  emails?: { value: string }[];
  photos?: { value: string }[];
};

/** The state check is ours (signed cookie, OAuthStateGuard), so the strategy's own store stays off. */
@Injectable()
export class GithubStrategy extends PassportStrategy(GitHub.Strategy, GITHUB_STRATEGY) {
  constructor(
    @Inject(HEXLOOM_OPTIONS) options: ResolvedOptions,
    private readonly auth: AuthService,
  ) {
    if (!options.github) throw new Error('GithubStrategy: github credentials are not configured');
    super({
      clientID: options.github.clientId,
      clientSecret: options.github.clientSecret,
      callbackURL: `${options.publicUrl}/api/auth/callback`,
      scope: ['read:user', 'user:email'],
    });
  }

  async validate(_accessToken: string, _refreshToken: string, profile: GithubProfile): Promise<User> {
    const login = profile.username ?? `user-${profile.id}`;
    return this.auth.upsertUser({
      providerId: String(profile.id),
      login,
      name: profile.displayName || login,
      email: profile.emails?.[0]?.value ?? null,
      avatarUrl: profile.photos?.[0]?.value ?? null,
    });
  }
}

/** passport-custom strategy verifying a fake-provider callback through the provider's own token and user logic. */
import { Inject, Injectable } from '@nestjs/common';
import passport from 'passport';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { PassportStrategy } from '@nestjs/passport';
import type { User } from '@hexloom/contracts';
import type { Request } from 'express';
import CustomStrategy from 'passport-custom';
import { LOCAL_IDP_CLIENT_ID, LocalIdpService } from '../local-idp/local-idp.service.js';
import { AuthService } from './auth.service.js';

/** Strategy name used by the callback guard when no GitHub credentials are configured. */
export const LOCAL_IDP_STRATEGY = 'local-idp';

/**
 * The strategy name of one application: passport keeps strategies in one registry per process, so two applications
 * in one process (tests of two servers) must not replace each other's.
 */
export const localIdpStrategyName = (instanceId: string): string => `${LOCAL_IDP_STRATEGY}:${instanceId}`;

/** Exchanges `?code` in-process (same logic as POST /api/local-idp/access_token and GET /user). */
@Injectable()
export class LocalIdpStrategy extends PassportStrategy(CustomStrategy, LOCAL_IDP_STRATEGY) {
  constructor(
    private readonly idp: LocalIdpService,
    private readonly auth: AuthService,
    @Inject(HEXLOOM_OPTIONS) options: ResolvedOptions,
  ) {
    super();
    passport.use(localIdpStrategyName(options.instanceId), this as unknown as passport.Strategy);
  }

  async validate(req: Request): Promise<User> {
    const code = typeof req.query['code'] === 'string' ? req.query['code'] : '';
    const token = this.idp.exchangeCode(code, LOCAL_IDP_CLIENT_ID, this.idp.callbackUrl());
    const profile = this.idp.userForToken(token);
    return this.auth.upsertUser({
      providerId: profile.id,
      login: profile.login,
      name: profile.name,
      email: profile.email,
      avatarUrl: profile.avatar_url,
    });
  }
}

/** Sign-in feature: session guard (global), the configured passport strategy, auth and me routes. */
import { type DynamicModule, Module, type Provider } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { PassportModule } from '@nestjs/passport';
import { AuditModule } from '../audit/audit.module.js';
import type { ResolvedOptions } from '../common/hexloom-options.js';
import { InvitationsModule } from '../invitations/invitations.module.js';
import { LocalIdpModule } from '../local-idp/local-idp.module.js';
import { TeamsModule } from '../teams/teams.module.js';
import { AuthController } from './auth.controller.js';
import { MeController } from './me.controller.js';
import { AuthService } from './auth.service.js';
import { GithubStrategy } from './github.strategy.js';
import { IdpCallbackGuard } from './idp-callback.guard.js';
import { LocalIdpStrategy } from './local-idp.strategy.js';
import { OAuthStateGuard } from './oauth-state.guard.js';
import { SessionAuthGuard } from './session-auth.guard.js';
import { SessionsService } from './sessions.service.js';

/** Registers the GitHub strategy with credentials, else the fake provider and its strategy. */
@Module({})
export class AuthModule {
  static forRoot(options: ResolvedOptions): DynamicModule {
    const strategy: Provider = options.github ? GithubStrategy : LocalIdpStrategy;
    return {
      module: AuthModule,
      imports: [PassportModule, AuditModule, InvitationsModule, TeamsModule, ...(options.github ? [] : [LocalIdpModule])],
      controllers: [AuthController, MeController],
      providers: [
        AuthService,
        SessionsService,
        OAuthStateGuard,
        IdpCallbackGuard,
        strategy,
        { provide: APP_GUARD, useClass: SessionAuthGuard },
      ],
    };
  }
}

/** Second guard of the callback: runs the configured passport strategy (GitHub or the fake provider). */
import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import { AuthGuard, type IAuthGuard } from '@nestjs/passport';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from '../common/hexloom-options.js';
import { GITHUB_STRATEGY } from './github.strategy.js';
import { localIdpStrategyName } from './local-idp.strategy.js';

/** Delegates to `AuthGuard('github')` or `AuthGuard('local-idp')`; sets `req.user` on success. */
@Injectable()
export class IdpCallbackGuard implements CanActivate {
  private readonly inner: IAuthGuard;

  constructor(@Inject(HEXLOOM_OPTIONS) options: ResolvedOptions) {
    const Guard = AuthGuard(options.github ? GITHUB_STRATEGY : localIdpStrategyName(options.instanceId));
    this.inner = new Guard();
  }

  canActivate(context: ExecutionContext): Promise<boolean> {
    return this.inner.canActivate(context) as Promise<boolean>;
  }
}

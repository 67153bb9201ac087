/** Rate limits of the sign-in and compute routes (@nestjs/throttler), counted per signed-in user or else per address. */
import { type CanActivate, type ExecutionContext, Inject, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { getOptionsToken, getStorageToken, ThrottlerGuard, type ThrottlerModuleOptions, type ThrottlerStorage } from '@nestjs/throttler';
import type { AuthedRequest } from './authed-request.js';

/** Requests per minute a sign-in route takes from one address, and a compute route from one user (defaults). */
export type RateLimits = { signInPerMinute: number; computePerMinute: number };

export const DEFAULT_RATE_LIMITS: RateLimits = { signInPerMinute: 60, computePerMinute: 300 };

/** The throttler names the limits are registered under. */
export const SIGN_IN_THROTTLER = 'sign-in';
export const COMPUTE_THROTTLER = 'compute';

/** The throttler's guard, counting a signed-in user's requests together wherever they come from, anyone else's by address. */
class UserOrAddressThrottler extends ThrottlerGuard {
  protected override getTracker(req: Record<string, unknown>): Promise<string> {
    const r = req as unknown as AuthedRequest;
    return Promise.resolve(r.user?.id ? `user:${r.user.id}` : `ip:${r.ip ?? 'unknown'}`);
  }
}

/**
 * The guard put on rate-limited controllers. It builds the throttler's guard itself from the module's options and
 * storage (injected by token), so it works whichever module loader gave the throttler its copy of Nest's classes.
 */
@Injectable()
export class UserOrAddressThrottlerGuard implements CanActivate {
  private readonly inner: UserOrAddressThrottler;
  private ready: Promise<void> | null = null;

  constructor(@Inject(getOptionsToken()) options: ThrottlerModuleOptions, @Inject(getStorageToken()) storage: ThrottlerStorage) {
    this.inner = new UserOrAddressThrottler(options, storage, new Reflector());
  }

  async canActivate(context: ExecutionContext): Promise<boolean> {
    this.ready ??= this.inner.onModuleInit();
    await this.ready;
    return this.inner.canActivate(context);
  }
}

/** Rate limits of the sign-in and compute routes (@nestjs/throttler), counted per signed-in user or else per address. */
import { Injectable } from '@nestjs/common';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { AuthedRequest } from './authed-request.js';

/** Requests per minute a sign-in route takes from one address, and a compute route from one user (defaults). */
export type RateLimits = { signInPerMinute: number; computePerMinute: number };

export const DEFAULT_RATE_LIMITS: RateLimits = { signInPerMinute: 60, computePerMinute: 300 };

/** The throttler names the limits are registered under. */
export const SIGN_IN_THROTTLER = 'sign-in';
export const COMPUTE_THROTTLER = 'compute';

/** Counts a signed-in user's requests together wherever they come from, and anyone else's by address. */
@Injectable()
export class UserOrAddressThrottlerGuard extends ThrottlerGuard {
  protected override getTracker(req: Record<string, unknown>): Promise<string> {
    const r = req as unknown as AuthedRequest;
    return Promise.resolve(r.user?.id ? `user:${r.user.id}` : `ip:${r.ip ?? 'unknown'}`);
  }
}

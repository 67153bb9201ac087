/** Global module of the request rate limits (see rate-limit.ts), sized from the options. */
import { type DynamicModule, Global, Module } from '@nestjs/common';
import { ThrottlerModule } from '@nestjs/throttler';
import type { ResolvedOptions } from './hexloom-options.js';
import { COMPUTE_THROTTLER, SIGN_IN_THROTTLER, UserOrAddressThrottlerGuard } from './rate-limit.js';

@Global()
@Module({})
export class RateLimitModule {
  static forRoot(options: ResolvedOptions): DynamicModule {
    const throttler = ThrottlerModule.forRoot([
      { name: SIGN_IN_THROTTLER, ttl: 60_000, limit: options.rateLimits.signInPerMinute },
      { name: COMPUTE_THROTTLER, ttl: 60_000, limit: options.rateLimits.computePerMinute },
    ]);
    return { module: RateLimitModule, imports: [throttler], providers: [UserOrAddressThrottlerGuard], exports: [throttler, UserOrAddressThrottlerGuard] };
  }
}

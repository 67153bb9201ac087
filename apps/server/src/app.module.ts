/** Root module: options, database and every feature module. */
import { type DynamicModule, Global, Module } from '@nestjs/common';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { BenchModule } from './bench/bench.module.js';
import { ChipsModule } from './chips/chips.module.js';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from './common/hexloom-options.js';
import { RateLimitModule } from './common/rate-limit.module.js';
import { ComputeModule } from './compute/compute.module.js';
import { ConfigurationsModule } from './configurations/configurations.module.js';
import { DatabaseModule } from './db/database.module.js';
import type { OpenDatabase } from './db/migrate.js';
import { ComputePoolModule } from './compute/compute-pool.module.js';
import { FiguresModule } from './figures/figures.module.js';
import { HealthModule } from './health/health.module.js';
import { InvitationsModule } from './invitations/invitations.module.js';
import { MailModule } from './mail/mail.module.js';
import { MeasurementsModule } from './measurements/measurements.module.js';
import { MembersModule } from './members/members.module.js';
import { ReviewsModule } from './reviews/reviews.module.js';
import { TeamsModule } from './teams/teams.module.js';

/** Makes the resolved options injectable everywhere. */
@Global()
@Module({})
class OptionsModule {
  static forRoot(options: ResolvedOptions): DynamicModule {
    return {
      module: OptionsModule,
      providers: [{ provide: HEXLOOM_OPTIONS, useValue: options }],
      exports: [HEXLOOM_OPTIONS],
    };
  }
}

/** The Hexloom application module for one set of options and one open database. */
@Module({})
export class AppModule {
  static forRoot(options: ResolvedOptions, database: OpenDatabase): DynamicModule {
    return {
      module: AppModule,
      imports: [
        OptionsModule.forRoot(options),
        RateLimitModule.forRoot(options),
        DatabaseModule.forRoot(database),
        AuthModule.forRoot(options),
        HealthModule,
        FiguresModule,
        ComputePoolModule,
        TeamsModule,
        MembersModule,
        InvitationsModule,
        AuditModule,
        MailModule,
        ChipsModule,
        ConfigurationsModule,
        ReviewsModule,
        ComputeModule,
        BenchModule,
        MeasurementsModule,
      ],
    };
  }
}

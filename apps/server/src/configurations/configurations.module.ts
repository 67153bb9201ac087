/** Configurations feature module: configurations, versions, optimistic concurrency, diffs. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { ChipsModule } from '../chips/chips.module.js';
import { ConfigurationsController } from './configurations.controller.js';
import { ConfigurationsService } from './configurations.service.js';

/** Exports ConfigurationsService for reviews, compute, uploads and bench export. */
@Module({ imports: [AuditModule, ChipsModule], controllers: [ConfigurationsController], providers: [ConfigurationsService], exports: [ConfigurationsService] })
export class ConfigurationsModule {}

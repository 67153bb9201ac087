/** Compute feature module: simulation, edits (synthesis, circuits) and yield jobs on a version. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { ConfigurationsModule } from '../configurations/configurations.module.js';
import { ComputeController } from './compute.controller.js';
import { EditService } from './edit.service.js';
import { SimulationService } from './simulation.service.js';
import { YieldJobsService } from './yield-jobs.service.js';
import { YieldQueueService } from '../queue/yield-queue.service.js';

/** Exports SimulationService for bench export (Touchstone) and measurement comparison. */
@Module({ imports: [AuditModule, ConfigurationsModule], controllers: [ComputeController], providers: [SimulationService, EditService, YieldJobsService, YieldQueueService], exports: [SimulationService] })
export class ComputeModule {}

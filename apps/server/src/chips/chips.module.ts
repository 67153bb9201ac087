/** Chips feature module: chips and their calibration. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { CalibrationService } from './calibration.service.js';
import { ChipsController } from './chips.controller.js';
import { ChipsService } from './chips.service.js';

/** Exports the services the configuration and bench features look chips up with. */
@Module({ imports: [AuditModule], controllers: [ChipsController], providers: [ChipsService, CalibrationService], exports: [ChipsService, CalibrationService] })
export class ChipsModule {}

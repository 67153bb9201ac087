/** Measurements feature module: uploads of measured spectra and the comparison route. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { ComputeModule } from '../compute/compute.module.js';
import { ConfigurationsModule } from '../configurations/configurations.module.js';
import { MeasurementsController } from './measurements.controller.js';
import { MeasurementsService } from './measurements.service.js';

/** Measured spectra of versions. */
@Module({ imports: [AuditModule, ConfigurationsModule, ComputeModule], controllers: [MeasurementsController], providers: [MeasurementsService] })
export class MeasurementsModule {}

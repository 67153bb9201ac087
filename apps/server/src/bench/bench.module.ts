/** Bench feature module: bench exports and Touchstone of a version. */
import { Module } from '@nestjs/common';
import { ChipsModule } from '../chips/chips.module.js';
import { ComputeModule } from '../compute/compute.module.js';
import { ConfigurationsModule } from '../configurations/configurations.module.js';
import { BenchExportController } from './bench-export.controller.js';
import { BenchExportService } from './bench-export.service.js';

/** Export routes. */
@Module({ imports: [ChipsModule, ConfigurationsModule, ComputeModule], controllers: [BenchExportController], providers: [BenchExportService] })
export class BenchModule {}

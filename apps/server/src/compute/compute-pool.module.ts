/** Global module of the compute worker pool (simulation, synthesis, figures) shared by every feature. */
import { Global, Module } from '@nestjs/common';
import { ComputePoolService } from './compute-pool.service.js';

@Global()
@Module({ providers: [ComputePoolService], exports: [ComputePoolService] })
export class ComputePoolModule {}

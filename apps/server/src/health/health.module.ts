/** Health feature module. */
import { Module } from '@nestjs/common';
import { HealthController } from './health.controller.js';

/** The public health route. */
@Module({ controllers: [HealthController] })
export class HealthModule {}

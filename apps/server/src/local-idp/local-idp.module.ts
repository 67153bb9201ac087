/** The fake identity provider's module. */
import { Module } from '@nestjs/common';
import { LocalIdpController } from './local-idp.controller.js';
import { LocalIdpService } from './local-idp.service.js';

/** Serves /api/local-idp/* and exports its service for the in-process callback strategy. */
@Module({ controllers: [LocalIdpController], providers: [LocalIdpService], exports: [LocalIdpService] })
export class LocalIdpModule {}

/** Teams feature module. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { TeamsController } from './teams.controller.js';
import { TeamsService } from './teams.service.js';

/** Team creation and reading. */
@Module({ imports: [AuditModule], controllers: [TeamsController], providers: [TeamsService], exports: [TeamsService] })
export class TeamsModule {}

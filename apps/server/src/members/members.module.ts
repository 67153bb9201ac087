/** Members feature module. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { MembersController } from './members.controller.js';
import { MembersService } from './members.service.js';

/** Listing members, changing roles and removing members. */
@Module({ imports: [AuditModule], controllers: [MembersController], providers: [MembersService] })
export class MembersModule {}

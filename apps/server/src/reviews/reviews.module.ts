/** Reviews feature module: review requests, decisions and comments. */
import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { ConfigurationsModule } from '../configurations/configurations.module.js';
import { MailModule } from '../mail/mail.module.js';
import { CommentsService } from './comments.service.js';
import { ReviewsController } from './reviews.controller.js';
import { ReviewsWaitingController } from './reviews-waiting.controller.js';
import { ReviewsWaitingService } from './reviews-waiting.service.js';
import { ReviewsService } from './reviews.service.js';

/** Review and comment routes of a version. */
@Module({ imports: [AuditModule, ConfigurationsModule, MailModule], controllers: [ReviewsController, ReviewsWaitingController], providers: [ReviewsService, CommentsService, ReviewsWaitingService] })
export class ReviewsModule {}

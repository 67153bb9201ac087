/** Mail feature: the mail service (SMTP or outbox) and the outbox route. */
import { Module } from '@nestjs/common';
import { MailService } from './mail.service.js';
import { OutboxController } from './outbox.controller.js';

/** Exports MailService for invitations, reviews and comments. */
@Module({ controllers: [OutboxController], providers: [MailService], exports: [MailService] })
export class MailModule {}

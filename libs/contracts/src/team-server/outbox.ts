/** E-mail messages kept by the local fake transport (the outbox). */
import { z } from 'zod';

export const mailKindSchema = z.enum(['invitation', 'review_requested', 'review_decided', 'mention']);
export type MailKind = z.infer<typeof mailKindSchema>;

export const outboxMessageSchema = z.object({
  id: z.uuid(),
  kind: mailKindSchema,
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  createdAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

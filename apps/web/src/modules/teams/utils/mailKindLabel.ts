// What kind of message an outbox entry is, in words.
import type { MailKind } from '@hexloom/contracts';

const LABELS: Record<MailKind, string> = {
  invitation: 'Invitation',
  review_requested: 'Review requested',
  review_decided: 'Review decided',
  mention: 'Mention',
};

/** "review_requested" -> "Review requested". */
export function mailKindLabel(kind: MailKind): string {
  return LABELS[kind];
}

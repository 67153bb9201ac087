// One outbox message, readable: subject, recipient, date and time, and the body as text with clickable links.
import { Card, Tag } from '@blueprintjs/core';
import type { OutboxMessage } from '@hexloom/contracts';
import { formatDate } from '../utils/formatDate.js';
import { mailKindLabel } from '../utils/mailKindLabel.js';
import { textWithLinks } from '../utils/textWithLinks.js';

/** The body keeps its line breaks; it is never rendered as HTML. */
export function OutboxMessageView({ message }: { message: OutboxMessage }) {
  return (
    <Card className="hx-outbox-message" data-testid="outbox-message" aria-labelledby={`outbox-subject-${message.id}`}>
      <h3 id={`outbox-subject-${message.id}`} style={{ marginTop: 0 }}>
        {message.subject}
      </h3>
      <dl className="hx-outbox-meta">
        <dt>To</dt>
        <dd>{message.to}</dd>
        <dt>Sent</dt>
        <dd>
          <time dateTime={message.createdAt}>{formatDate(message.createdAt)}</time>
        </dd>
        <dt>Kind</dt>
        <dd>
          <Tag minimal>{mailKindLabel(message.kind)}</Tag>
        </dd>
      </dl>
      <div className="hx-outbox-body" style={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' }} data-testid="outbox-body">
        {textWithLinks(message.text).map((part, i) =>
          part.kind === 'link' ? (
            <a key={i} href={part.href} target="_blank" rel="noopener noreferrer">
              {part.href}
            </a>
          ) : (
            <span key={i}>{part.text}</span>
          ),
        )}
      </div>
    </Card>
  );
}

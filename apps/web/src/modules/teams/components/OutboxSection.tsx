// The team's outbox: the mail the local fake transport sent, newest first, a list on one side and the open message.
import { Button, Callout, NonIdealState } from '@blueprintjs/core';
import { useState } from 'react';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useOutbox } from '../api/useOutbox.js';
import { formatDate } from '../utils/formatDate.js';
import { OutboxMessageView } from './OutboxMessageView.js';
import './outbox.css';

/** Owners read it; anyone else gets the server's 403 in words. */
export function OutboxSection({ teamId }: { teamId: string }) {
  const outbox = useOutbox(teamId);
  const [openId, setOpenId] = useState<string | undefined>(undefined);
  if (outbox.isPending) return <PageSpinner label="Loading the outbox" />;
  if (outbox.isError) {
    const forbidden = outbox.error instanceof ApiRequestError && outbox.error.statusCode === 403;
    return forbidden ? (
      <Callout intent="warning" title="Only owners of this team can read its outbox" role="alert" data-testid="outbox-forbidden">
        {outbox.error.message}
      </Callout>
    ) : (
      <ApiErrorCallout error={outbox.error} title="Could not load the outbox" onRetry={() => void outbox.refetch()} />
    );
  }
  const messages = [...outbox.data].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  if (messages.length === 0) {
    return <NonIdealState icon="inbox" title="The outbox is empty" description="Invitations, review requests, decisions and mentions appear here once Hexloom sends them (when mail goes through a real server, nothing is kept here)." />;
  }
  const open = messages.find((m) => m.id === openId) ?? messages[0];
  return (
    <div className="hx-outbox" data-testid="outbox">
      <ul className="hx-outbox-list" aria-label="Messages, newest first">
        {messages.map((m) => (
          <li key={m.id}>
            <Button
              variant="minimal"
              alignText="start"
              fill
              active={m.id === open?.id}
              aria-current={m.id === open?.id ? 'true' : undefined}
              onClick={() => setOpenId(m.id)}
              data-testid="outbox-item"
            >
              <strong>{m.subject}</strong>
              <br />
              <span className="hx-muted">
                to {m.to} · {formatDate(m.createdAt)}
              </span>
            </Button>
          </li>
        ))}
      </ul>
      {open && <OutboxMessageView message={open} />}
    </div>
  );
}

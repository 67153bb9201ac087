// The team's recent activity in words, newest first, with "Show more" (the audit log, readable by owners only).
import { Button, Callout, Spinner } from '@blueprintjs/core';
import { useMemo, useState } from 'react';
import { useMe } from '../../auth/api/useMe.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useTeamMembers } from '../../teams/api/useTeamMembers.js';
import { formatDate } from '../../teams/utils/formatDate.js';
import { AUDIT_LIMIT_MAX, useAuditLog } from '../api/useAuditLog.js';
import { describeAuditEvent } from '../utils/describeAuditEvent.js';
import '../activity.css';

/** Events per page. */
export const ACTIVITY_PAGE = 20;

/** Props of {@link RecentActivity}. */
export type RecentActivityProps = { teamId: string };

/**
 * For owners: one line per event ("Noor Halvorsen saved v3 of Interferer notch", with date and time), newest first,
 * 20 at a time up to the server's 500. Other roles see a one-line note that the log is the owners' to read.
 */
export function RecentActivity({ teamId }: RecentActivityProps) {
  const me = useMe();
  const role = me.data?.teams.find((t) => t.id === teamId)?.role;
  const isOwner = role === 'owner';
  const [pages, setPages] = useState(1);
  const limit = Math.min(pages * ACTIVITY_PAGE, AUDIT_LIMIT_MAX);
  const log = useAuditLog(teamId, limit, isOwner);
  const members = useTeamMembers(teamId);
  const nameOf = useMemo(() => {
    const names = new Map((members.data ?? []).map((m) => [m.login, m.name || m.login]));
    return (login: string) => names.get(login) ?? login;
  }, [members.data]);
  if (me.isPending) return null;
  if (!isOwner) {
    return (
      <section aria-labelledby="recent-activity-heading" data-testid="recent-activity">
        <h2 id="recent-activity-heading" className="hx-section-title">
          Recent activity
        </h2>
        <Callout intent="none" icon="lock">Only the team's owners can read its activity log.</Callout>
      </section>
    );
  }
  const events = log.data ?? [];
  const more = events.length >= limit && limit < AUDIT_LIMIT_MAX;
  return (
    <section className="hx-stack" aria-labelledby="recent-activity-heading" data-testid="recent-activity">
      <h2 id="recent-activity-heading" className="hx-section-title">
        Recent activity
      </h2>
      {log.isPending && <Spinner size={30} aria-label="Loading the recent activity" />}
      <ApiErrorCallout error={log.error} title="Could not load the recent activity" onRetry={() => void log.refetch()} />
      {log.isSuccess && events.length === 0 && <p className="hx-muted">Nothing has happened in this team yet.</p>}
      {events.length > 0 && (
        <ol className="hx-activity" aria-label="Recent activity, newest first">
          {events.map((e) => (
            <li key={e.id} data-testid="activity-entry">
              <span>{describeAuditEvent(e, nameOf)}</span>
              <time dateTime={e.at} className="hx-muted">
                {formatDate(e.at)}
              </time>
            </li>
          ))}
        </ol>
      )}
      {more && <Button text="Show more" icon="more" loading={log.isFetching} onClick={() => setPages((p) => p + 1)} className="hx-activity-more" />}
      {!more && events.length >= AUDIT_LIMIT_MAX && <p className="hx-muted">These are the newest {AUDIT_LIMIT_MAX} events; older ones stay in the server's log.</p>}
    </section>
  );
}

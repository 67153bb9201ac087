// /t/:teamSlug/outbox: the mail the local fake transport sent for the team (owners).
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';
import { OutboxSection } from '../modules/teams/components/OutboxSection.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';

/** The team's outbox, newest message first. */
export function OutboxPage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  useDocumentTitle(team ? `Outbox of ${team.name}` : 'Outbox');
  if (isLoading) return <PageSpinner />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  return (
    <div data-testid="outbox-page">
      <header className="hx-page-header">
        <h1>{team.name}</h1>
        <span className="hx-muted">outbox · the e-mail Hexloom sent while mail goes to the local outbox</span>
      </header>
      <section className="hx-section">
        <OutboxSection teamId={team.id} />
      </section>
    </div>
  );
}

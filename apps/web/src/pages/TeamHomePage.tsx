// /t/:teamSlug: the team's home.
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { RoleTag } from '../modules/teams/components/RoleTag.js';
import { ChipsOverview } from '../modules/chips/components/ChipsOverview.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';
import { RecentActivity } from '../modules/activity/components/RecentActivity.js';
import { WaitingForMyReview } from '../modules/versions/components/WaitingForMyReview.js';

/** Team name, the user's role, the team's chips with their configurations (or what to do first), reviews waiting and, for owners, recent activity. */
export function TeamHomePage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  useDocumentTitle(team?.name ?? 'Team');
  if (isLoading) return <PageSpinner />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  return (
    <div data-testid="team-home">
      <header className="hx-page-header">
        <h1>{team.name}</h1>
        <span className="hx-muted">
          your role <RoleTag role={team.role} />
        </span>
      </header>
      <div className="hx-team-home">
        <ChipsOverview teamId={team.id} teamSlug={team.slug} />
        <aside className="hx-stack" aria-label="For you">
          <WaitingForMyReview teamId={team.id} teamSlug={team.slug} />
          {team.role === 'owner' && <RecentActivity teamId={team.id} />}
        </aside>
      </div>
    </div>
  );
}

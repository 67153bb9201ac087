// /t/:teamSlug: the team's home.
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { RoleTag } from '../modules/teams/components/RoleTag.js';
import { TeamHomeEmptyState } from '../modules/teams/components/TeamHomeEmptyState.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';

/** Team name, the user's role, and what to do next. */
export function TeamHomePage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
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
      <TeamHomeEmptyState />
    </div>
  );
}

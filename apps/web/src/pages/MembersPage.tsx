// /t/:teamSlug/members: who is in the team, and (for owners) invitations.
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { InviteMemberForm } from '../modules/teams/components/InviteMemberForm.js';
import { PendingInvitations } from '../modules/teams/components/PendingInvitations.js';
import { RoleTag } from '../modules/teams/components/RoleTag.js';
import { TeamMembersSection } from '../modules/teams/components/TeamMembersSection.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';

/** Members table for everyone; invite form and pending invitations for owners. */
export function MembersPage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  useDocumentTitle(team ? `Members of ${team.name}` : 'Members');
  if (isLoading) return <PageSpinner />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  return (
    <div data-testid="members-page">
      <header className="hx-page-header">
        <h1>{team.name}</h1>
        <span className="hx-muted">
          members · your role <RoleTag role={team.role} />
        </span>
      </header>
      <TeamMembersSection team={team} />
      {team.role === 'owner' ? (
        <section className="hx-section">
          <h2>Invite someone</h2>
          <InviteMemberForm teamId={team.id} />
          <h2 style={{ marginTop: 28 }}>Pending invitations</h2>
          <PendingInvitations teamId={team.id} />
        </section>
      ) : null}
    </div>
  );
}

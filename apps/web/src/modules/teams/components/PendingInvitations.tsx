// The pending invitations of a team, each with a revoke button (owners only).
import { Button, HTMLTable, NonIdealState } from '@blueprintjs/core';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useRevokeInvitation } from '../api/useRevokeInvitation.js';
import { useTeamInvitations } from '../api/useTeamInvitations.js';
import { formatDate } from '../utils/formatDate.js';
import { RoleTag } from './RoleTag.js';

/** Lists invitations not yet accepted; accepted ones are members already. */
export function PendingInvitations({ teamId }: { teamId: string }) {
  const invitations = useTeamInvitations(teamId, true);
  const revoke = useRevokeInvitation(teamId);

  if (invitations.isPending) return <PageSpinner label="Loading invitations" />;
  if (invitations.isError) return <ApiErrorCallout error={invitations.error} title="Could not load the invitations" />;

  const pending = invitations.data.filter((invitation) => invitation.acceptedAt === null);
  return (
    <div data-testid="pending-invitations">
      <ApiErrorCallout error={revoke.error} title="Could not revoke the invitation" />
      {pending.length === 0 ? (
        <NonIdealState icon="envelope" title="No pending invitations" description="People you invite appear here until they sign in." />
      ) : (
        <HTMLTable compact striped style={{ width: '100%' }}>
          <thead>
            <tr>
              <th>E-mail</th>
              <th>Role</th>
              <th>Invited by</th>
              <th>Sent</th>
              <th aria-label="Actions" />
            </tr>
          </thead>
          <tbody>
            {pending.map((invitation) => (
              <tr key={invitation.id}>
                <td>{invitation.email}</td>
                <td>
                  <RoleTag role={invitation.role} />
                </td>
                <td className="hx-mono">{invitation.invitedBy}</td>
                <td className="hx-mono">{formatDate(invitation.createdAt)}</td>
                <td style={{ textAlign: 'right' }}>
                  <Button
                    size="small"
                    variant="minimal"
                    intent="danger"
                    icon="cross"
                    text="Revoke"
                    aria-label={`Revoke the invitation of ${invitation.email}`}
                    loading={revoke.isPending && revoke.variables === invitation.id}
                    onClick={() => revoke.mutate(invitation.id)}
                  />
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
    </div>
  );
}

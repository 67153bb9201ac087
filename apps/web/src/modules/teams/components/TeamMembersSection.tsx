// Members of a team with the owner's controls: change a role, remove a member (after a confirmation).
import { Alert } from '@blueprintjs/core';
import type { Member, MyTeam } from '@hexloom/contracts';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useChangeMemberRole } from '../api/useChangeMemberRole.js';
import { useRemoveMember } from '../api/useRemoveMember.js';
import { useTeamMembers } from '../api/useTeamMembers.js';
import { MembersTable } from './MembersTable.js';

/** The members table of `team`; read-only unless the user is an owner of it. */
export function TeamMembersSection({ team }: { team: MyTeam }) {
  const canManage = team.role === 'owner';
  const members = useTeamMembers(team.id);
  const changeRole = useChangeMemberRole(team.id);
  const removeMember = useRemoveMember(team.id);
  const [toRemove, setToRemove] = useState<Member | null>(null);

  if (members.isPending) return <PageSpinner label="Loading members" />;
  if (members.isError) return <ApiErrorCallout error={members.error} title="Could not load the members" />;

  const busyUserId = changeRole.isPending
    ? changeRole.variables?.userId
    : removeMember.isPending
      ? removeMember.variables
      : undefined;

  return (
    <section className="hx-section">
      <h2>
        Members <span className="hx-muted hx-mono">{members.data.length}</span>
      </h2>
      {!canManage ? <p className="hx-muted">Only owners of this team can change roles or invite people.</p> : null}
      <ApiErrorCallout error={changeRole.error} title="Could not change the role" />
      <ApiErrorCallout error={removeMember.error} title="Could not remove the member" />
      <MembersTable
        members={members.data}
        canManage={canManage}
        busyUserId={busyUserId}
        onChangeRole={(userId, role) => {
          removeMember.reset();
          changeRole.mutate({ userId, role });
        }}
        onRemove={(member) => setToRemove(member)}
      />
      <Alert
        isOpen={toRemove !== null}
        intent="danger"
        icon="remove"
        confirmButtonText="Remove"
        cancelButtonText="Cancel"
        onCancel={() => setToRemove(null)}
        onConfirm={() => {
          if (toRemove) {
            changeRole.reset();
            removeMember.mutate(toRemove.userId);
          }
          setToRemove(null);
        }}
      >
        <p>
          Remove <strong>{toRemove?.name}</strong> (<span className="hx-mono">{toRemove?.login}</span>) from {team.name}?
          They lose access to the team's chips and designs.
        </p>
      </Alert>
    </section>
  );
}

// Form to invite a person to a team by e-mail address and role.
import { Button, FormGroup, HTMLSelect, InputGroup } from '@blueprintjs/core';
import { TEAM_ROLES, type TeamRole } from '@hexloom/contracts';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useCreateInvitation } from '../api/useCreateInvitation.js';

/** Sends POST /api/teams/:teamId/invitations; shows the server's message and field issues on failure. */
export function InviteMemberForm({ teamId }: { teamId: string }) {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<TeamRole>('designer');
  const createInvitation = useCreateInvitation(teamId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    createInvitation.mutate({ email, role }, { onSuccess: () => setEmail('') });
  };

  return (
    <form onSubmit={submit} data-testid="invite-form">
      <div className="hx-invite-form">
        <FormGroup label="E-mail address" labelFor="invite-email">
          <InputGroup
            id="invite-email"
            type="email"
            required
            placeholder="colleague@example.org"
            value={email}
            onValueChange={(value) => setEmail(value)}
            style={{ width: 280 }}
          />
        </FormGroup>
        <FormGroup label="Role" labelFor="invite-role">
          <HTMLSelect
            id="invite-role"
            value={role}
            onChange={(event) => setRole(event.currentTarget.value as TeamRole)}
            className="hx-role"
            options={TEAM_ROLES}
          />
        </FormGroup>
        <Button type="submit" intent="primary" icon="envelope" text="Invite" loading={createInvitation.isPending} />
      </div>
      <div style={{ marginTop: 12 }}>
        <ApiErrorCallout error={createInvitation.error} title="Could not send the invitation" />
      </div>
    </form>
  );
}

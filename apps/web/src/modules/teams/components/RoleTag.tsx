// A small tag naming a team role; owners in amber.
import { Tag } from '@blueprintjs/core';
import type { TeamRole } from '@hexloom/contracts';
import { roleLabels } from '../utils/roleLabels.js';

/** The role as a rounded tag, e.g. "Owner". */
export function RoleTag({ role }: { role: TeamRole }) {
  return (
    <Tag round intent={role === 'owner' ? 'warning' : 'none'} minimal={role !== 'owner'} data-testid="role-tag">
      {roleLabels[role]}
    </Tag>
  );
}

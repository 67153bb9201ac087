// A small tag naming a team role; owners in amber (the role word stays lower-case in the DOM, CSS capitalises it).
import { Tag } from '@blueprintjs/core';
import type { TeamRole } from '@hexloom/contracts';

/** The role as a rounded tag, e.g. "Owner". */
export function RoleTag({ role }: { role: TeamRole }) {
  return (
    <Tag round intent={role === 'owner' ? 'warning' : 'none'} minimal={role !== 'owner'} data-testid="role-tag" className="hx-role">
      {role}
    </Tag>
  );
}

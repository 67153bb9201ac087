// Words shown for each team role.
import type { TeamRole } from '@hexloom/contracts';

/** Capitalised role names for selects, tags and tables. */
export const roleLabels: Record<TeamRole, string> = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
  viewer: 'Viewer',
};

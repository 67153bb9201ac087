/** Team roles and what each may do; shared by server guards and web UI. */
import { z } from 'zod';

/** The four roles a member can hold in a team. */
export const teamRoleSchema = z.enum(['owner', 'designer', 'reviewer', 'viewer']);
export type TeamRole = z.infer<typeof teamRoleSchema>;

/** Every role, most privileged first (for pickers and matrices). */
export const TEAM_ROLES: readonly TeamRole[] = teamRoleSchema.options;

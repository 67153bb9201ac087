/** A signed-in person as the API returns them. */
import { z } from 'zod';
import { teamRoleSchema } from './roles.js';

export const userSchema = z.object({
  id: z.string().uuid(),
  login: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  avatarUrl: z.string().nullable(),
});
export type User = z.infer<typeof userSchema>;

/** A team the current user belongs to, with their role in it. */
export const myTeamSchema = z.object({
  id: z.string().uuid(),
  slug: z.string(),
  name: z.string(),
  role: teamRoleSchema,
});
export type MyTeam = z.infer<typeof myTeamSchema>;

/** Body of GET /api/me. */
export const meSchema = z.object({ user: userSchema, teams: z.array(myTeamSchema) });
export type Me = z.infer<typeof meSchema>;

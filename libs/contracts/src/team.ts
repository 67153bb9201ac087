/** Teams, their members and invitations: API bodies and answers. */
import { z } from 'zod';
import { singleLineText } from './plain-text.js';
import { teamRoleSchema } from './roles.js';

export const teamSchema = z.object({
  id: z.string().uuid(),
  slug: z.string(),
  name: z.string(),
  createdAt: z.string(),
});
export type Team = z.infer<typeof teamSchema>;

/** POST /api/teams body. */
export const createTeamSchema = z.object({
  name: singleLineText(2, 80),
  slug: z
    .string()
    .regex(/^[a-z0-9][a-z0-9-]{1,39}$/, 'lower-case letters, digits and dashes, 2 to 40 characters')
    .optional(),
});
export type CreateTeam = z.infer<typeof createTeamSchema>;

export const memberSchema = z.object({
  userId: z.string().uuid(),
  login: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  role: teamRoleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

/** PATCH /api/teams/:teamId/members/:userId body. */
export const changeRoleSchema = z.object({ role: teamRoleSchema });
export type ChangeRole = z.infer<typeof changeRoleSchema>;

export const invitationSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  role: teamRoleSchema,
  invitedBy: z.string(),
  createdAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** POST /api/teams/:teamId/invitations body. */
export const createInvitationSchema = z.object({
  email: z.string().trim().toLowerCase().email(),
  role: teamRoleSchema,
});
export type CreateInvitation = z.infer<typeof createInvitationSchema>;

export const auditEventSchema = z.object({
  id: z.string().uuid(),
  at: z.string(),
  actor: z.string().nullable(),
  action: z.string(),
  target: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

/** GET /api/teams/:teamId/audit query. */
export const auditQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(500).default(100),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

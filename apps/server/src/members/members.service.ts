/** Team members: list, change role, remove; keeps at least one owner per team. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { type Member, TEAM_ROLES, type TeamRole, type User } from '@hexloom/contracts';
import { and, asc, count, eq } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { memberships, users } from '../db/schema/index.js';
import { LastOwnerError } from './last-owner.error.js';

const memberColumns = {
  userId: users.id,
  login: users.login,
  name: users.name,
  email: users.email,
  role: memberships.role,
  joinedAt: memberships.createdAt,
};

type MemberRow = { userId: string; login: string; name: string; email: string | null; role: TeamRole; joinedAt: Date };

const toMember = (row: MemberRow): Member => ({ ...row, joinedAt: row.joinedAt.toISOString() });

/** Member operations; the caller's role was checked by TeamRolesGuard. */
@Injectable()
export class MembersService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly audit: AuditService,
  ) {}

  /** Members of a team, owners first then by login. */
  async list(teamId: string): Promise<Member[]> {
    const rows = await this.db
      .select(memberColumns)
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.teamId, teamId))
      .orderBy(asc(users.login));
    const rank = (role: TeamRole): number => TEAM_ROLES.indexOf(role);
    return rows.map(toMember).sort((a, b) => rank(a.role) - rank(b.role));
  }

  /** The member `userId` of `teamId`, or 404. */
  async findOrFail(teamId: string, userId: string, executor: DbExecutor = this.db): Promise<Member> {
    const [row] = await executor
      .select(memberColumns)
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
    if (!row) throw new NotFoundException(`User "${userId}" is not a member of team "${teamId}"`);
    return toMember(row);
  }

  /** Sets a member's role; 409 when it would demote the last owner. */
  async changeRole(actor: User, teamId: string, userId: string, role: TeamRole): Promise<Member> {
    return this.db.transaction(async (tx) => {
      const member = await this.findOrFail(teamId, userId, tx);
      if (member.role === role) return member;
      if (member.role === 'owner') await this.assertAnotherOwner(tx, teamId, member.login);
      await tx
        .update(memberships)
        .set({ role })
        .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
      await this.audit.record(
        { action: 'member.role_changed', teamId, actorId: actor.id, target: member.login, detail: { userId, from: member.role, to: role } },
        tx,
      );
      return { ...member, role };
    });
  }

  /** Removes a member; 409 when they are the last owner. */
  async remove(actor: User, teamId: string, userId: string): Promise<void> {
    await this.db.transaction(async (tx) => {
      const member = await this.findOrFail(teamId, userId, tx);
      if (member.role === 'owner') await this.assertAnotherOwner(tx, teamId, member.login);
      await tx.delete(memberships).where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
      await this.audit.record(
        { action: 'member.removed', teamId, actorId: actor.id, target: member.login, detail: { userId, role: member.role } },
        tx,
      );
    });
  }

  private async assertAnotherOwner(tx: DbExecutor, teamId: string, login: string): Promise<void> {
    const [owners] = await tx
      .select({ n: count() })
      .from(memberships)
      .where(and(eq(memberships.teamId, teamId), eq(memberships.role, 'owner')));
    if ((owners?.n ?? 0) <= 1) throw new LastOwnerError(login, teamId);
  }
}

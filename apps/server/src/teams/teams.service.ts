/** Teams: create, list the caller's, read one. */
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { CreateTeam, MyTeam, Team, User } from '@hexloom/contracts';
import { asc, eq, like, or } from 'drizzle-orm';
import { AuditService } from '../audit/audit.service.js';
import { DATABASE, type Database, type DbExecutor } from '../db/database.js';
import { memberships, type TeamRow, teams } from '../db/schema/index.js';
import { SlugTakenError } from './team-errors.js';
import { slugify } from './slugify.js';

/** Converts a row to the API shape. */
export function toTeam(row: TeamRow): Team {
  return { id: row.id, slug: row.slug, name: row.name, createdAt: row.createdAt.toISOString() };
}

/** Team operations; membership checks happen in TeamRolesGuard before these run. */
@Injectable()
export class TeamsService {
  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly audit: AuditService,
  ) {}

  /** The team with `teamId`, or 404. */
  async findOrFail(teamId: string): Promise<Team> {
    const [row] = await this.db.select().from(teams).where(eq(teams.id, teamId));
    if (!row) throw new NotFoundException(`Team "${teamId}" not found`);
    return toTeam(row);
  }

  /** Teams `userId` belongs to, with their role, by name. */
  async listMine(userId: string): Promise<MyTeam[]> {
    return this.db
      .select({ id: teams.id, slug: teams.slug, name: teams.name, role: memberships.role })
      .from(memberships)
      .innerJoin(teams, eq(teams.id, memberships.teamId))
      .where(eq(memberships.userId, userId))
      .orderBy(asc(teams.name), asc(teams.slug));
  }

  /**
   * Creates a team with `creator` as its owner. A given slug must be free (409 otherwise);
   * a derived one gets a numeric suffix until free.
   */
  async create(creator: User, body: CreateTeam): Promise<Team> {
    return this.db.transaction(async (tx) => {
      const slug = body.slug ?? (await this.freeSlug(tx, slugify(body.name)));
      const [row] = await tx.insert(teams).values({ slug, name: body.name }).onConflictDoNothing().returning();
      if (!row) throw new SlugTakenError(slug);
      await tx.insert(memberships).values({ teamId: row.id, userId: creator.id, role: 'owner' });
      await this.audit.record(
        { action: 'team.created', teamId: row.id, actorId: creator.id, target: row.slug, detail: { name: row.name } },
        tx,
      );
      return toTeam(row);
    });
  }

  private async freeSlug(tx: DbExecutor, base: string): Promise<string> {
    const taken = new Set(
      (
        await tx
          .select({ slug: teams.slug })
          .from(teams)
          .where(or(eq(teams.slug, base), like(teams.slug, `${base}-%`)))
      ).map((r) => r.slug),
    );
    if (!taken.has(base)) return base;
    for (let n = 2; ; n++) {
      const candidate = `${base}-${n}`;
      if (!taken.has(candidate)) return candidate;
    }
  }
}

/** Seeds the invented demo team and accounts; safe to run on every start. */
import { and, eq } from 'drizzle-orm';
import type { Database } from './database.js';
import { DEMO_ACCOUNTS, DEMO_TEAM } from './demo-accounts.js';
import { localProviderId } from './local-provider-id.js';
import { memberships, teams, users } from './schema/index.js';

/** What the seed found or created. */
export type SeedResult = { teamId: string; createdUsers: number; createdMemberships: number };

/**
 * Inserts the demo team, its users and memberships unless they already exist.
 * A second run creates nothing (conflicts are ignored, existing rows are reused).
 */
export async function seedDemo(db: Database): Promise<SeedResult> {
  return db.transaction(async (tx) => {
    await tx.insert(teams).values({ slug: DEMO_TEAM.slug, name: DEMO_TEAM.name }).onConflictDoNothing();
    const [team] = await tx.select().from(teams).where(eq(teams.slug, DEMO_TEAM.slug));
    if (!team) throw new Error(`seedDemo: team "${DEMO_TEAM.slug}" missing after insert`);
    let createdUsers = 0;
    let createdMemberships = 0;
    for (const account of DEMO_ACCOUNTS) {
      const inserted = await tx
        .insert(users)
        .values({
          provider: 'github',
          providerId: localProviderId(account.login),
          login: account.login,
          name: account.name,
          email: account.email,
        })
        .onConflictDoNothing()
        .returning({ id: users.id });
      createdUsers += inserted.length;
      const [user] = await tx
        .select({ id: users.id })
        .from(users)
        .where(and(eq(users.provider, 'github'), eq(users.providerId, localProviderId(account.login))));
      if (!user) throw new Error(`seedDemo: user "${account.login}" missing after insert`);
      const joined = await tx
        .insert(memberships)
        .values({ teamId: team.id, userId: user.id, role: account.role })
        .onConflictDoNothing()
        .returning({ userId: memberships.userId });
      createdMemberships += joined.length;
    }
    return { teamId: team.id, createdUsers, createdMemberships };
  });
}

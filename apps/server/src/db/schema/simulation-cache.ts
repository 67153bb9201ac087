/** The simulation_cache table: solver answers of one team, keyed by the SHA-256 of the team and the inputs. */
import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams.js';

/**
 * `hash` covers the team, the configuration content, the ports and the grid, so equal inputs of one team share one
 * answer and no team learns whether another simulated the same thing. Bounded per team (oldest use evicted first).
 */
export const simulationCache = pgTable(
  'simulation_cache',
  {
    hash: text('hash').primaryKey(),
    teamId: uuid('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    answer: jsonb('answer').$type<unknown>().notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    usedAt: timestamp('used_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('simulation_cache_team_used_idx').on(t.teamId, t.usedAt)],
);

export type SimulationCacheRow = typeof simulationCache.$inferSelect;

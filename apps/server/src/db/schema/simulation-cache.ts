/** The simulation_cache table: solver answers keyed by the SHA-256 of their inputs. */
import { jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** `hash` covers the configuration content, the ports and the grid, so equal inputs share one answer. */
export const simulationCache = pgTable('simulation_cache', {
  hash: text('hash').primaryKey(),
  answer: jsonb('answer').$type<unknown>().notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export type SimulationCacheRow = typeof simulationCache.$inferSelect;

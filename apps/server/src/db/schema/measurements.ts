/** The measurements table: measured spectra (CSV or Touchstone) attached to a version. */
import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { configurationVersions } from './configuration-versions.js';
import { users } from './users.js';

/** Power of the measured connection `from` -> `to` at absolute frequencies (parsed once at upload). */
export type MeasuredPoints = { frequencyHz: number[]; powerDb: number[] };

/** One upload; `text` keeps the original file, `points` what was read from it. */
export const measurements = pgTable(
  'measurements',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    versionId: uuid('version_id')
      .notNull()
      .references(() => configurationVersions.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    format: text('format').$type<'csv' | 'touchstone'>().notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    fromPort: text('from_port').notNull(),
    toPort: text('to_port').notNull(),
    label: text('label').notNull().default(''),
    text: text('text').notNull(),
    points: jsonb('points').$type<MeasuredPoints>().notNull(),
    uploadedBy: uuid('uploaded_by')
      .notNull()
      .references(() => users.id),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('measurements_version_idx').on(t.versionId)],
);

export type MeasurementRow = typeof measurements.$inferSelect;

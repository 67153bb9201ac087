/** The calibrations table: uploaded calibration files of a chip; the newest is the current one. */
import type { ShifterCalibrationBody } from '@hexloom/contracts';
import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { chips } from './chips.js';
import { users } from './users.js';

/** One accepted calibration upload (every row valid), shifters in SI units. */
export const calibrations = pgTable(
  'calibrations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    chipId: uuid('chip_id')
      .notNull()
      .references(() => chips.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    shifters: jsonb('shifters').$type<ShifterCalibrationBody[]>().notNull(),
    uploadedBy: uuid('uploaded_by')
      .notNull()
      .references(() => users.id),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('calibrations_chip_idx').on(t.chipId, t.uploadedAt)],
);

export type CalibrationRow = typeof calibrations.$inferSelect;

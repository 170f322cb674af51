import { doublePrecision, integer, pgTable, smallint, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { bytea } from './columns.js';
import { logRuns } from './log-runs.js';

/**
 * One curve of a log run. `samples` holds the values as little-endian float64 bytes
 * (NaN for null), one row per curve rather than one row per sample. Position 0 is the index.
 */
export const curves = pgTable(
  'curves',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    logRunId: uuid('log_run_id')
      .notNull()
      .references(() => logRuns.id, { onDelete: 'cascade' }),
    position: smallint('position').notNull(),
    mnemonic: text('mnemonic').notNull(),
    originalMnemonic: text('original_mnemonic').notNull(),
    unit: text('unit').notNull(),
    description: text('description').notNull().default(''),
    curveClass: text('curve_class'),
    samples: bytea('samples').notNull(),
    nullCount: integer('null_count').notNull(),
    min: doublePrecision('min'),
    max: doublePrecision('max'),
  },
  (t) => [uniqueIndex('curves_run_position_unique').on(t.logRunId, t.position)],
);

export type Curve = typeof curves.$inferSelect;
export type NewCurve = typeof curves.$inferInsert;

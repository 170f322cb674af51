import { boolean, doublePrecision, integer, jsonb, pgTable, smallint, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { bytea } from './columns.js';
import { users } from './users.js';
import { wells } from './wells.js';

export interface StoredHeaderItem {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
}
export interface StoredDiagnostic {
  severity: 'error' | 'warning' | 'info';
  line: number | null;
  message: string;
}

/** One uploaded LAS file of a well: its original bytes (for audit), header and diagnostics. */
export const logRuns = pgTable(
  'log_runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    wellId: uuid('well_id')
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    sha256: text('sha256').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    original: bytea('original').notNull(),
    lasVersion: text('las_version').notNull(),
    wrapped: boolean('wrapped').notNull(),
    header: jsonb('header').$type<Record<string, StoredHeaderItem[]>>().notNull(),
    diagnostics: jsonb('diagnostics').$type<StoredDiagnostic[]>().notNull(),
    depthUnit: text('depth_unit').notNull(),
    start: doublePrecision('start').notNull(),
    stop: doublePrecision('stop').notNull(),
    step: doublePrecision('step'),
    rowCount: integer('row_count').notNull(),
    curveCount: smallint('curve_count').notNull(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('log_runs_well_sha256_unique').on(t.wellId, t.sha256)],
);

export type LogRun = typeof logRuns.$inferSelect;
export type NewLogRun = typeof logRuns.$inferInsert;

import { integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { reviewStatus } from './review.js';
import { users } from './users.js';
import { wells } from './wells.js';

/**
 * One version of a well's interpretation: a snapshot of everything that produced it (tops,
 * curve bindings, zone parameters, formation cutoffs, log-run sha256s) and the zone summaries
 * the server computed from it. draft -> submitted -> approved | returned; approved versions
 * are immutable, and an edit after approval starts the next version as a draft.
 */
export const interpretations = pgTable(
  'interpretations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    wellId: uuid('well_id')
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    status: reviewStatus('status').notNull().default('draft'),
    inputs: jsonb('inputs').$type<Record<string, unknown>>().notNull(),
    summaries: jsonb('summaries').$type<Record<string, unknown>[]>().notNull(),
    warnings: jsonb('warnings').$type<Record<string, unknown>[]>().notNull().default([]),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    submittedBy: uuid('submitted_by').references(() => users.id, { onDelete: 'set null' }),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
    reviewedBy: uuid('reviewed_by').references(() => users.id, { onDelete: 'set null' }),
    reviewedAt: timestamp('reviewed_at', { withTimezone: true }),
    reviewComment: text('review_comment'),
    ...timestamps,
  },
  (t) => [uniqueIndex('interpretations_well_version_unique').on(t.wellId, t.version)],
);

export type Interpretation = typeof interpretations.$inferSelect;
export type NewInterpretation = typeof interpretations.$inferInsert;

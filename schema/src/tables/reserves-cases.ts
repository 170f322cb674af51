import { integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { assets } from './assets.js';
import { timestamps } from './columns.js';
import { formations } from './formations.js';
import { reviewStatus } from './review.js';
import { users } from './users.js';

/**
 * A reserves case: a target formation of an asset, the approved interpretations that feed it
 * (with the values taken from each, so staleness can be shown), the engineer's inputs and
 * overrides (each with a reason), the Monte Carlo seed, and the last computed results.
 * Reviewed like interpretations; immutable once approved.
 */
export const reservesCases = pgTable('reserves_cases', {
  id: uuid('id').primaryKey().defaultRandom(),
  assetId: uuid('asset_id')
    .notNull()
    .references(() => assets.id, { onDelete: 'cascade' }),
  formationId: uuid('formation_id')
    .notNull()
    .references(() => formations.id, { onDelete: 'restrict' }),
  name: text('name').notNull(),
  status: reviewStatus('status').notNull().default('draft'),
  revision: integer('revision').notNull().default(1),
  sources: jsonb('sources').$type<Record<string, unknown>[]>().notNull(),
  inputs: jsonb('inputs').$type<Record<string, unknown>>().notNull(),
  results: jsonb('results').$type<Record<string, unknown> | null>(),
  seed: integer('seed').notNull(),
  createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
  submittedBy: uuid('submitted_by').references(() => users.id, { onDelete: 'set null' }),
  submittedAt: timestamp('submitted_at', { withTimezone: true }),
  reviewedBy: uuid('reviewed_by').references(() => users.id, { onDelete: 'set null' }),
  reviewedAt: timestamp('reviewed_at', { withTimezone: true }),
  reviewComment: text('review_comment'),
  ...timestamps,
});

export type ReservesCase = typeof reservesCases.$inferSelect;
export type NewReservesCase = typeof reservesCases.$inferInsert;

import { jsonb, pgEnum, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { users } from './users.js';
import { wells } from './wells.js';

/** Kinds of production data a well can hold for the cross-checks. */
export const productionKind = pgEnum('production_kind', ['pressure', 'rate']);

/**
 * Production data of a well: static pressure against cumulative gas (p/z), or rate against
 * time (decline). Points are kept as entered or uploaded, with their units.
 */
export const productionSeries = pgTable('production_series', {
  id: uuid('id').primaryKey().defaultRandom(),
  wellId: uuid('well_id')
    .notNull()
    .references(() => wells.id, { onDelete: 'cascade' }),
  kind: productionKind('kind').notNull(),
  fluid: text('fluid').notNull(),
  units: jsonb('units').$type<Record<string, string>>().notNull(),
  points: jsonb('points').$type<Record<string, number>[]>().notNull(),
  fileName: text('file_name'),
  uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
  ...timestamps,
});

export type ProductionSeries = typeof productionSeries.$inferSelect;
export type NewProductionSeries = typeof productionSeries.$inferInsert;

import { doublePrecision, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { formations } from './formations.js';
import { wells } from './wells.js';

/** The measured depth of a formation top in a well (in the well's log depth unit). */
export const wellTops = pgTable(
  'well_tops',
  {
    wellId: uuid('well_id')
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    formationId: uuid('formation_id')
      .notNull()
      .references(() => formations.id, { onDelete: 'cascade' }),
    md: doublePrecision('md').notNull(),
    /** How it was picked: typed in a table, clicked on the depth view, or imported. */
    source: text('source').notNull().default('table'),
    ...timestamps,
  },
  (t) => [primaryKey({ columns: [t.wellId, t.formationId] })],
);

export type WellTop = typeof wellTops.$inferSelect;
export type NewWellTop = typeof wellTops.$inferInsert;

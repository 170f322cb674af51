import { boolean, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { logRuns } from './log-runs.js';
import { wells } from './wells.js';

/**
 * Which log run and curve supplies each input of the evaluation for a well (gr, rhob, nphi,
 * dt, rt, sp, cali, pe, ...). The reader proposes; the user confirms or overrides. Curves of
 * several runs are merged onto one depth index through these bindings.
 */
export const curveBindings = pgTable(
  'curve_bindings',
  {
    wellId: uuid('well_id')
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    binding: text('binding').notNull(),
    logRunId: uuid('log_run_id')
      .notNull()
      .references(() => logRuns.id, { onDelete: 'cascade' }),
    mnemonic: text('mnemonic').notNull(),
    confirmed: boolean('confirmed').notNull().default(false),
    ...timestamps,
  },
  (t) => [primaryKey({ columns: [t.wellId, t.binding] })],
);

export type CurveBinding = typeof curveBindings.$inferSelect;
export type NewCurveBinding = typeof curveBindings.$inferInsert;

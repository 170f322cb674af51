import { jsonb, pgTable, primaryKey, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { formations } from './formations.js';
import { wells } from './wells.js';

/**
 * Evaluation method choices and parameters of one zone (a formation in a well). The shape is
 * core's ZoneParameters; the service validates it with core before storing.
 */
export const zoneParameters = pgTable(
  'zone_parameters',
  {
    wellId: uuid('well_id')
      .notNull()
      .references(() => wells.id, { onDelete: 'cascade' }),
    formationId: uuid('formation_id')
      .notNull()
      .references(() => formations.id, { onDelete: 'cascade' }),
    params: jsonb('params').$type<Record<string, unknown>>().notNull(),
    ...timestamps,
  },
  (t) => [primaryKey({ columns: [t.wellId, t.formationId] })],
);

export type ZoneParameterRow = typeof zoneParameters.$inferSelect;
export type NewZoneParameterRow = typeof zoneParameters.$inferInsert;

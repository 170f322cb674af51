import { doublePrecision, integer, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { assets } from './assets.js';
import { timestamps } from './columns.js';

/**
 * A formation name shared by every well of an asset, in stratigraphic order, with its colour
 * and its net-pay cutoffs (set once per formation, used in every well). Cutoffs are inclusive:
 * Vsh <= vshMax, porosity >= phiMin, Sw <= swMax, permeability >= permMin (when set).
 */
export const formations = pgTable(
  'formations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    assetId: uuid('asset_id')
      .notNull()
      .references(() => assets.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    ordinal: integer('ordinal').notNull(),
    colour: text('colour').notNull(),
    lithology: text('lithology').notNull().default('sandstone'),
    vshMax: doublePrecision('vsh_max').notNull().default(0.4),
    phiMin: doublePrecision('phi_min').notNull().default(0.08),
    swMax: doublePrecision('sw_max').notNull().default(0.6),
    permMin: doublePrecision('perm_min'),
    ...timestamps,
  },
  (t) => [uniqueIndex('formations_asset_name_unique').on(t.assetId, t.name)],
);

export type Formation = typeof formations.$inferSelect;
export type NewFormation = typeof formations.$inferInsert;

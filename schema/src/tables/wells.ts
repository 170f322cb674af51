import { doublePrecision, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { assets } from './assets.js';
import { timestamps } from './columns.js';

/** A well of an asset. Depths of its logs are measured depth from `depthReference`. */
export const wells = pgTable(
  'wells',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    assetId: uuid('asset_id')
      .notNull()
      .references(() => assets.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    uwi: text('uwi').notNull().default(''),
    latitude: doublePrecision('latitude'),
    longitude: doublePrecision('longitude'),
    kbElevation: doublePrecision('kb_elevation'),
    groundElevation: doublePrecision('ground_elevation'),
    depthReference: text('depth_reference').notNull().default('KB'),
    ...timestamps,
  },
  (t) => [uniqueIndex('wells_asset_name_unique').on(t.assetId, t.name)],
);

export type Well = typeof wells.$inferSelect;
export type NewWell = typeof wells.$inferInsert;

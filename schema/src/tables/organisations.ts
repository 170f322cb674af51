import { pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';

/** A company or team that owns assets and users. */
export const organisations = pgTable('organisations', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull(),
  ...timestamps,
});

export type Organisation = typeof organisations.$inferSelect;
export type NewOrganisation = typeof organisations.$inferInsert;

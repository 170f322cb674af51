import { boolean, pgEnum, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './columns.js';
import { organisations } from './organisations.js';
import { users } from './users.js';

/** A field or project. Everything below it (wells, logs, cases) is visible to its members only. */
export const assets = pgTable('assets', {
  id: uuid('id').primaryKey().defaultRandom(),
  organisationId: uuid('organisation_id')
    .notNull()
    .references(() => organisations.id, { onDelete: 'cascade' }),
  name: text('name').notNull(),
  description: text('description').notNull().default(''),
  isDemo: boolean('is_demo').notNull().default(false),
  ...timestamps,
});

/** The five roles of the design; `admin` may also be held per asset. */
export const memberRole = pgEnum('member_role', ['admin', 'petrophysicist', 'engineer', 'reviewer', 'viewer']);
export type MemberRole = (typeof memberRole.enumValues)[number];

/** One role per member per asset. */
export const assetMembers = pgTable(
  'asset_members',
  {
    assetId: uuid('asset_id')
      .notNull()
      .references(() => assets.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: memberRole('role').notNull(),
    ...timestamps,
  },
  (t) => [primaryKey({ columns: [t.assetId, t.userId] })],
);

export type Asset = typeof assets.$inferSelect;
export type NewAsset = typeof assets.$inferInsert;
export type AssetMember = typeof assetMembers.$inferSelect;

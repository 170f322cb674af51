import { bigserial, jsonb, pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { assets } from './assets.js';
import { users } from './users.js';

/** Who changed what, when, with the value before and after. Rows are never updated. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    assetId: uuid('asset_id').references(() => assets.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    before: jsonb('before').$type<unknown>(),
    after: jsonb('after').$type<unknown>(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_log_asset_at').on(t.assetId, t.at)],
);

export type AuditEntry = typeof auditLog.$inferSelect;
export type NewAuditEntry = typeof auditLog.$inferInsert;

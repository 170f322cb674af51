import { index, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { assets } from './assets.js';
import { users } from './users.js';

/** Where a notice stands: waiting to go, accepted by the SMTP server, or refused with an error. */
export const mailStatus = pgEnum('mail_status', ['pending', 'sent', 'failed']);

/**
 * Every e-mail notice the service sends (review requests and outcomes), kept as written, with
 * what the SMTP server said. In development the built-in catcher receives the mail and its raw
 * message (headers and body, as it arrived) is kept in `caught`, for admins to read.
 */
export const mailMessages = pgTable(
  'mail_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    assetId: uuid('asset_id').references(() => assets.id, { onDelete: 'cascade' }),
    toUserId: uuid('to_user_id').references(() => users.id, { onDelete: 'set null' }),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    body: text('body').notNull(),
    /** What the notice is about, e.g. `interpretation.submitted`. */
    event: text('event').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    /** The Message-ID header it was sent with. */
    messageId: text('message_id').notNull(),
    status: mailStatus('status').notNull().default('pending'),
    error: text('error'),
    /** The raw message as the built-in catcher received it (development and tests only). */
    caught: text('caught'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [index('mail_messages_created').on(t.createdAt), index('mail_messages_message_id').on(t.messageId)],
);

export type MailMessage = typeof mailMessages.$inferSelect;
export type NewMailMessage = typeof mailMessages.$inferInsert;

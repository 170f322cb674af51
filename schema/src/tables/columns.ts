import { customType, timestamp } from 'drizzle-orm/pg-core';

/** created_at / updated_at, shared by every table that is edited. */
export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date()),
};

/** PostgreSQL bytea as Uint8Array (PGlite returns Uint8Array, node-postgres a Buffer, which is one). */
export const bytea = customType<{ data: Uint8Array; driverData: Uint8Array }>({
  dataType() {
    return 'bytea';
  },
});

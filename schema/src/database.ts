import { PGlite } from '@electric-sql/pglite';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import { fileURLToPath } from 'node:url';
import * as tables from './tables/index.js';

export const schema = tables;
export type Schema = typeof tables;
/** The Drizzle database both drivers give: PGlite (embedded) and node-postgres (server). */
export type Database = PgDatabase<PgQueryResultHKT, Schema>;

/** Folder of the generated SQL migrations (committed, read in review). */
export const migrationsFolder = fileURLToPath(new URL('../drizzle', import.meta.url));

export interface OpenDatabase {
  db: Database;
  driver: 'pglite' | 'postgres';
  /** Runs every pending migration. */
  migrate(): Promise<void>;
  /** True when `select 1` answers. */
  ping(): Promise<boolean>;
  close(): Promise<void>;
}

/**
 * Opens the database: a PostgreSQL server when `url` is given (DATABASE_URL), otherwise an
 * embedded PGlite database in `dataDir` (created if missing; `memory://` for a throw-away one).
 */
export async function openDatabase(options: { url?: string; dataDir?: string }): Promise<OpenDatabase> {
  if (options.url) {
    const pool = new pg.Pool({ connectionString: options.url });
    const db = drizzlePg(pool, { schema: tables }) as unknown as Database;
    return {
      db,
      driver: 'postgres',
      migrate: () => migratePg(db as never, { migrationsFolder }),
      ping: async () => (await pool.query('select 1 as ok')).rows[0]?.ok === 1,
      close: () => pool.end(),
    };
  }
  const client = await PGlite.create(options.dataDir ?? 'memory://');
  const db = drizzlePglite(client, { schema: tables }) as unknown as Database;
  return {
    db,
    driver: 'pglite',
    migrate: () => migratePglite(db as never, { migrationsFolder }),
    ping: async () => (await client.query<{ ok: number }>('select 1 as ok')).rows[0]?.ok === 1,
    close: () => client.close(),
  };
}

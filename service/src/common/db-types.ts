import type { Database } from '@poreline/schema';

/** A Drizzle transaction of the app's database (what `db.transaction(fn)` hands to `fn`). */
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];

/** Either the database or an open transaction: repositories write through whichever they get. */
export type Executor = Database | Transaction;

import { Global, Inject, Injectable, Module, type OnApplicationShutdown } from '@nestjs/common';
import type { Database, OpenDatabase } from '@poreline/schema';

/** Injection token of the open database handle (PGlite or PostgreSQL through Drizzle). */
export const DATABASE_HANDLE = Symbol('DATABASE_HANDLE');

/** Gives repositories the Drizzle database and closes it when the app shuts down. */
@Injectable()
export class DatabaseService implements OnApplicationShutdown {
  constructor(@Inject(DATABASE_HANDLE) private readonly handle: OpenDatabase) {}

  get db(): Database {
    return this.handle.db;
  }

  ping(): Promise<boolean> {
    return this.handle.ping();
  }

  async onApplicationShutdown(): Promise<void> {
    await this.handle.close();
  }
}

@Global()
@Module({})
export class DatabaseModule {
  /** The handle is opened and migrated before Nest starts (see main.ts / test helpers). */
  static forHandle(handle: OpenDatabase) {
    return {
      module: DatabaseModule,
      providers: [{ provide: DATABASE_HANDLE, useValue: handle }, DatabaseService],
      exports: [DatabaseService],
    };
  }
}

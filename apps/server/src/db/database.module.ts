/** Global Nest module providing the Drizzle handle under the DATABASE token and closing it on shutdown. */
import { type DynamicModule, Global, Inject, Injectable, Module, type OnApplicationShutdown } from '@nestjs/common';
import type { PGlite } from '@electric-sql/pglite';
import { DATABASE } from './database.js';
import type { OpenDatabase } from './migrate.js';

const PGLITE_CLIENT = Symbol('hexloom:pglite-client');

/** Closes the PGlite client when the application shuts down. */
@Injectable()
class DatabaseCloser implements OnApplicationShutdown {
  constructor(@Inject(PGLITE_CLIENT) private readonly client: PGlite) {}

  async onApplicationShutdown(): Promise<void> {
    if (!this.client.closed) await this.client.close();
  }
}

/** Provides an already-opened and migrated database to every feature module. */
@Global()
@Module({})
export class DatabaseModule {
  /** Registers `open.db` under DATABASE. */
  static forRoot(open: OpenDatabase): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [
        { provide: DATABASE, useValue: open.db },
        { provide: PGLITE_CLIENT, useValue: open.client },
        DatabaseCloser,
      ],
      exports: [DATABASE],
    };
  }
}

/** Global Nest module providing the Drizzle handle under the DATABASE token and closing it on shutdown. */
import { type DynamicModule, Global, Inject, Injectable, Module, type OnApplicationShutdown } from '@nestjs/common';
import { DATABASE } from './database.js';
import type { OpenDatabase } from './migrate.js';

/** Injection token of the open database itself (its mode, its close). */
export const OPEN_DATABASE = Symbol('hexloom:open-database');

/** Closes the database (and frees its data folder) when the application shuts down. */
@Injectable()
class DatabaseCloser implements OnApplicationShutdown {
  constructor(@Inject(OPEN_DATABASE) private readonly open: OpenDatabase) {}

  async onApplicationShutdown(): Promise<void> {
    await this.open.close();
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
        { provide: OPEN_DATABASE, useValue: open },
        DatabaseCloser,
      ],
      exports: [DATABASE, OPEN_DATABASE],
    };
  }
}

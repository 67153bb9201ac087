/** createHexloomApp: database, migrations, seed, middleware, OpenAPI; returns an initialised app. */
import { type INestApplication, Logger, type LogLevel } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { AppModule } from './app.module.js';
import { ApiExceptionFilter } from './common/api-exception.filter.js';
import type { HexloomOptions } from './common/hexloom-options.js';
import { resolveOptions } from './common/resolve-options.js';
import { sameOriginOnly } from './common/same-origin.middleware.js';
import { setupOpenApi } from './common/setup-open-api.js';
import { openDatabase, openServerDatabase } from './db/migrate.js';
import { seedDemo } from './db/seed.js';
import { seedDemoDesigns } from './db/seed-demo-designs.js';
import { serveWebApp } from './web/serve-web-app.js';

/** Largest JSON request body, bytes (larger ones are a 413). */
export const MAX_JSON_BODY_BYTES = 4 * 1024 * 1024;

/** Options of createHexloomApp; `logLevels` defaults to errors and warnings only. */
export type CreateHexloomAppOptions = HexloomOptions & { logLevels?: LogLevel[] };

/**
 * Opens (and migrates) the database, seeds the demo when asked, and returns an initialised,
 * not yet listening Nest application. Close it with `app.close()` (closes the database too).
 */
export async function createHexloomApp(options: CreateHexloomAppOptions): Promise<INestApplication> {
  const resolved = resolveOptions(options);
  const database = resolved.databaseUrl ? await openServerDatabase(resolved.databaseUrl) : await openDatabase(resolved.dataDir);
  try {
    await database.exclusive(async () => {
      if (resolved.seedDemo) await seedDemo(database.db);
      if (resolved.seedDemoDesigns) await seedDemoDesigns(database.db);
    });
    const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(resolved, database), {
      logger: options.logLevels ?? ['error', 'warn'],
      abortOnError: false,
      bodyParser: false,
    });
    app.setGlobalPrefix('api');
    // A configuration embeds its chip: allow bodies up to 4 MiB (a 60 x 60 chip's configuration is well under that).
    app.useBodyParser('json', { limit: MAX_JSON_BODY_BYTES });
    app.useBodyParser('urlencoded', { limit: '64kb', extended: false });
    app.useGlobalFilters(new ApiExceptionFilter());
    app.disable('x-powered-by');
    app.use(
      helmet({
        contentSecurityPolicy: {
          directives: {
            defaultSrc: ["'self'"],
            scriptSrc: ["'self'"],
            // The local sign-in page and the API docs page carry inline styles.
            styleSrc: ["'self'", "'unsafe-inline'"],
            imgSrc: ["'self'", 'data:', 'https://avatars.githubusercontent.com'],
            formAction: ["'self'", resolved.publicUrl],
            upgradeInsecureRequests: resolved.cookieSecure ? [] : null,
          },
        },
      }),
    );
    app.use(sameOriginOnly(resolved.publicUrl));
    app.use(cookieParser(resolved.sessionSecret));
    setupOpenApi(app);
    if (resolved.webDistDir && !serveWebApp(app, resolved.webDistDir)) {
      new Logger('Hexloom').warn(`No built web app at ${resolved.webDistDir} (run npm run build -w apps/web); serving the API only`);
    }
    await app.init();
    return app;
  } catch (error) {
    await database.close();
    throw error;
  }
}

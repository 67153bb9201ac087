/** Process entry: reads the environment, starts Hexloom and listens. */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { Logger } from '@nestjs/common';
import { createHexloomApp } from './app.factory.js';
import { findRepoRoot } from './common/find-repo-root.js';
import { HEXLOOM_OPTIONS, type ResolvedOptions } from './common/hexloom-options.js';
import { EnvironmentError, readServerEnvironment } from './common/server-environment.js';

/** SESSION_SECRET, or one generated once and kept in the data dir (random per run for `memory`). */
function sessionSecret(dataDir: string): string {
  const fromEnv = process.env['SESSION_SECRET'];
  if (fromEnv) return fromEnv;
  if (dataDir === 'memory') return randomBytes(32).toString('hex');
  const file = join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

async function main(): Promise<void> {
  const root = findRepoRoot();
  // A .env file at the repository root (see .env.example) fills in what the shell did not set.
  const envFile = join(root, '.env');
  if (existsSync(envFile)) process.loadEnvFile(envFile);
  const { options, port, host } = readServerEnvironment(process.env);
  const envDataDir = process.env['HEXLOOM_DATA_DIR'];
  const dataDir = envDataDir === 'memory' ? 'memory' : resolve(envDataDir || join(root, 'data'));
  const databaseUrl = process.env['DATABASE_URL'] || undefined;
  // Servers sharing a PostgreSQL database must sign cookies alike: the secret cannot be one each keeps locally.
  if (databaseUrl && !process.env['SESSION_SECRET']) throw new EnvironmentError('DATABASE_URL is set: set SESSION_SECRET too, the same on every server sharing that database');
  const app = await createHexloomApp({
    ...options,
    dataDir,
    ...(databaseUrl ? { databaseUrl } : {}),
    webDistDir: join(root, 'apps', 'web', 'dist'),
    sessionSecret: sessionSecret(databaseUrl ? 'memory' : dataDir),
  });
  app.enableShutdownHooks();
  await app.listen(port, host);
  const logger = new Logger('Hexloom');
  const resolved = app.get<ResolvedOptions>(HEXLOOM_OPTIONS);
  if (resolved.localIdp) {
    logger.warn(
      `The built-in local sign-in is ON: whoever reaches ${resolved.publicUrl} can sign in as any account, owners included. ` +
        'Keep it to your own machine; for a shared server set GITHUB_CLIENT_ID and GITHUB_CLIENT_SECRET.',
    );
  }
  logger.log(`Hexloom is running at ${resolved.publicUrl} (listening on ${host}:${port})`);
}

main().catch((error: unknown) => {
  if (error instanceof Error && ['InvalidOptionsError', 'EnvironmentError', 'DataDirLockedError'].includes(error.name)) console.error(`hexloom: ${error.message}`);
  else console.error(error);
  process.exit(1);
});

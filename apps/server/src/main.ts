/** Process entry: reads the environment, starts Hexloom and listens. */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { Logger } from '@nestjs/common';
import { createHexloomApp } from './app.factory.js';
import { findRepoRoot } from './common/find-repo-root.js';

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
  const port = Number(process.env['PORT'] ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) throw new Error(`PORT "${process.env['PORT']}" is not a TCP port`);
  const envDataDir = process.env['HEXLOOM_DATA_DIR'];
  const dataDir = envDataDir === 'memory' ? 'memory' : resolve(envDataDir || join(root, 'data'));
  const publicUrl = process.env['PUBLIC_URL'] || `http://localhost:${port}`;
  const clientId = process.env['GITHUB_CLIENT_ID'];
  const clientSecret = process.env['GITHUB_CLIENT_SECRET'];
  const cookieSecure = process.env['HEXLOOM_COOKIE_SECURE'] === 'true' ? true : undefined;
  const app = await createHexloomApp({
    dataDir,
    seedDemo: (process.env['HEXLOOM_SEED_DEMO'] ?? 'true') !== 'false',
    seedDemoDesigns: (process.env['HEXLOOM_SEED_DEMO_DESIGNS'] ?? 'true') !== 'false',
    webDistDir: join(root, 'apps', 'web', 'dist'),
    publicUrl,
    sessionSecret: sessionSecret(dataDir),
    ...(clientId && clientSecret ? { github: { clientId, clientSecret } } : {}),
    ...(cookieSecure ? { cookieSecure } : {}),
    ...(process.env['SMTP_URL'] ? { smtpUrl: process.env['SMTP_URL'] } : {}),
    logLevels: ['log', 'error', 'warn'],
  });
  app.enableShutdownHooks();
  await app.listen(port);
  new Logger('Hexloom').log(`Hexloom is running at ${publicUrl}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});

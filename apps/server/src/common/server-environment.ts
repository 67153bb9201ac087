/** The server's settings read from environment variables (see .env.example), before any default is applied. */
import type { CreateHexloomAppOptions } from '../app.factory.js';
import { DEFAULT_RATE_LIMITS } from './rate-limit.js';

/** What `main` starts: the app options, the port and the address to listen on. */
export type ServerEnvironment = { options: Omit<CreateHexloomAppOptions, 'dataDir' | 'sessionSecret' | 'webDistDir'>; port: number; host: string };

/** Thrown for an environment variable with a value that cannot work; the message names it. */
export class EnvironmentError extends Error {
  override readonly name = 'EnvironmentError';
}

const flag = (env: NodeJS.ProcessEnv, name: string): boolean | undefined => {
  const v = env[name];
  if (v === undefined || v === '') return undefined;
  if (v === 'true' || v === 'false') return v === 'true';
  throw new EnvironmentError(`${name} must be true or false, got "${v}"`);
};

/**
 * PORT (default 3000), HOST (default 127.0.0.1: this machine only; 0.0.0.0 to serve a network), PUBLIC_URL,
 * GITHUB_CLIENT_ID / GITHUB_CLIENT_SECRET, HEXLOOM_LOCAL_IDP, HEXLOOM_COOKIE_SECURE, HEXLOOM_SEED_DEMO(_DESIGNS), SMTP_URL,
 * HEXLOOM_RATE_SIGN_IN_PER_MINUTE and HEXLOOM_RATE_COMPUTE_PER_MINUTE (defaults 60 and 300), HEXLOOM_QUEUE_WORKER (with
 * DATABASE_URL: whether this server takes yield chunks itself, default true).
 */
export function readServerEnvironment(env: NodeJS.ProcessEnv): ServerEnvironment {
  const port = Number(env['PORT'] ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) throw new EnvironmentError(`PORT "${env['PORT']}" is not a TCP port`);
  const host = env['HOST'] || '127.0.0.1';
  const clientId = env['GITHUB_CLIENT_ID'];
  const clientSecret = env['GITHUB_CLIENT_SECRET'];
  const localIdp = flag(env, 'HEXLOOM_LOCAL_IDP');
  const cookieSecure = flag(env, 'HEXLOOM_COOKIE_SECURE');
  const queueWorker = flag(env, 'HEXLOOM_QUEUE_WORKER');
  const perMinute = (name: string, fallback: number): number => {
    const v = env[name];
    if (v === undefined || v === '') return fallback;
    const n = Number(v);
    if (!Number.isInteger(n) || n < 1) throw new EnvironmentError(`${name} must be a whole number of requests per minute >= 1, got "${v}"`);
    return n;
  };
  const rateLimits = { signInPerMinute: perMinute('HEXLOOM_RATE_SIGN_IN_PER_MINUTE', DEFAULT_RATE_LIMITS.signInPerMinute), computePerMinute: perMinute('HEXLOOM_RATE_COMPUTE_PER_MINUTE', DEFAULT_RATE_LIMITS.computePerMinute) };
  return {
    port,
    host,
    options: {
      host,
      rateLimits,
      seedDemo: flag(env, 'HEXLOOM_SEED_DEMO') ?? true,
      seedDemoDesigns: flag(env, 'HEXLOOM_SEED_DEMO_DESIGNS') ?? true,
      publicUrl: env['PUBLIC_URL'] || `http://localhost:${port}`,
      ...(clientId && clientSecret ? { github: { clientId, clientSecret } } : {}),
      ...(localIdp !== undefined ? { localIdp } : {}),
      ...(cookieSecure ? { cookieSecure } : {}),
      ...(queueWorker !== undefined ? { queueWorker } : {}),
      ...(env['SMTP_URL'] ? { smtpUrl: env['SMTP_URL'] } : {}),
      logLevels: ['log', 'error', 'warn'],
    },
  };
}

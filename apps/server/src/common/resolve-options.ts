/** Applies defaults to createHexloomApp options. */
import { randomBytes } from 'node:crypto';
import type { HexloomOptions, ResolvedOptions } from './hexloom-options.js';
import { DEFAULT_QUEUE_TIMING } from '../queue/yield-queue.js';
import { DEFAULT_RATE_LIMITS } from './rate-limit.js';

/** Thrown for options that cannot work; the message names the bad value. */
export class InvalidOptionsError extends Error {
  override readonly name = 'InvalidOptionsError';
}

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|\[::1\]|localhost)$/i;

/** Whether a host name or address only this machine can reach. */
export function isLoopback(host: string): boolean {
  return LOOPBACK.test(host);
}

/**
 * The built-in local sign-in lets whoever reaches it choose any account, so without code-host credentials it runs
 * only when asked for explicitly, or on a server only this machine can reach (loopback address, http loopback URL).
 */
function localIdpAllowed(asked: boolean | undefined, host: string, publicUrl: string): true {
  if (asked === true) return true;
  const url = new URL(publicUrl);
  if (asked === undefined && isLoopback(host) && url.protocol === 'http:' && isLoopback(url.hostname)) return true;
  const why = asked === false ? 'the local sign-in is turned off (HEXLOOM_LOCAL_IDP=false)' : `the server would be reachable beyond this machine (host ${host}, public URL ${publicUrl}), where the local sign-in would let anyone sign in as any account`;
  throw new InvalidOptionsError(`no sign-in provider: ${why}; set GITHUB_CLIENT_ID and GITHUB_CLIENT_SECRET for the code-host sign-in, or HEXLOOM_LOCAL_IDP=true to accept the local one`);
}

/** Defaults: publicUrl `http://localhost:3000`, random session secret, Secure cookie on https. */
export function resolveOptions(options: HexloomOptions): ResolvedOptions {
  const publicUrl = (options.publicUrl ?? 'http://localhost:3000').replace(/\/+$/, '');
  if (!/^https?:\/\/[^/]+$/.test(publicUrl)) {
    throw new InvalidOptionsError(`publicUrl "${publicUrl}" must be an origin like http://localhost:3000`);
  }
  const github = options.github?.clientId && options.github.clientSecret ? options.github : null;
  const host = options.host ?? '127.0.0.1';
  const localIdp = github ? false : localIdpAllowed(options.localIdp, host, publicUrl);
  return {
    host,
    instanceId: randomBytes(8).toString('hex'),
    localIdp,
    rateLimits: options.rateLimits ?? DEFAULT_RATE_LIMITS,
    dataDir: options.dataDir,
    databaseUrl: options.databaseUrl || null,
    queueWorker: options.queueWorker ?? true,
    queueTiming: options.queueTiming ?? DEFAULT_QUEUE_TIMING,
    seedDemo: options.seedDemo,
    seedDemoDesigns: options.seedDemo && (options.seedDemoDesigns ?? true),
    webDistDir: options.webDistDir ?? null,
    publicUrl,
    sessionSecret: options.sessionSecret || randomBytes(32).toString('hex'),
    github,
    cookieSecure: options.cookieSecure ?? publicUrl.startsWith('https://'),
    smtpUrl: options.smtpUrl || null,
    mailFrom: options.mailFrom ?? 'Hexloom <hexloom@localhost>',
  };
}

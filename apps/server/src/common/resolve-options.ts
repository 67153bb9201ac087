/** Applies defaults to createHexloomApp options. */
import { randomBytes } from 'node:crypto';
import type { HexloomOptions, ResolvedOptions } from './hexloom-options.js';

/** Thrown for options that cannot work; the message names the bad value. */
export class InvalidOptionsError extends Error {
  override readonly name = 'InvalidOptionsError';
}

/** Defaults: publicUrl `http://localhost:3000`, random session secret, Secure cookie on https. */
export function resolveOptions(options: HexloomOptions): ResolvedOptions {
  const publicUrl = (options.publicUrl ?? 'http://localhost:3000').replace(/\/+$/, '');
  if (!/^https?:\/\/[^/]+$/.test(publicUrl)) {
    throw new InvalidOptionsError(`publicUrl "${publicUrl}" must be an origin like http://localhost:3000`);
  }
  const github = options.github?.clientId && options.github.clientSecret ? options.github : null;
  return {
    dataDir: options.dataDir,
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

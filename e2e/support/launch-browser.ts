// Launches Debian's Chromium through playwright-core (no browser download); a missing browser is a failure.
import { existsSync, mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { REPO_ROOT } from './start-server.js';

export const CHROMIUM_PATH = process.env.HEXLOOM_CHROMIUM ?? '/usr/bin/chromium';
export const SCREENSHOT_DIR = join(REPO_ROOT, '.artifacts', 'screenshots');

export async function launchBrowser(): Promise<BrowserContext> {
  if (!existsSync(CHROMIUM_PATH)) {
    throw new Error(`Chromium not found at ${CHROMIUM_PATH}: install it with "apt-get install -y chromium" (scripts/test.sh does)`);
  }
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'hexloom-chromium-')), {
    executablePath: CHROMIUM_PATH,
    viewport: { width: 1280, height: 800 },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

// Accessibility: axe-core on every page of the web app, signed out and signed in as a demo designer, in light and
// dark themes and at a phone's width. No critical or serious violation of WCAG 2.1 A/AA (axe-core's rules) may remain.
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seriousViolations } from './support/axe.js';
import { launchBrowser, SCREENSHOT_DIR } from './support/launch-browser.js';
import { startServer, type RunningServer } from './support/start-server.js';

let server: RunningServer;
let browser: BrowserContext;
let page: Page;

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  page = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

async function check(name: string): Promise<void> {
  await page.screenshot({ path: join(SCREENSHOT_DIR, `a11y-${name}.png`), fullPage: true });
  expect(await seriousViolations(page), name).toEqual([]);
}

async function setTheme(theme: 'light' | 'dark'): Promise<void> {
  await page.evaluate(`localStorage.setItem('hexloom.theme', '${theme}')`);
  await page.reload();
}

describe('every page under axe-core', () => {
  it('has no critical or serious violation on the sign-in page', async () => {
    await page.goto(`${server.url}/signin`);
    await page.getByTestId('signin-button').waitFor();
    await check('signin');
  });

  it('has none on the team home, the members page, the chip page and the 404 page', async () => {
    await page.getByTestId('signin-button').click();
    await page.getByTestId('account-noor').click();
    await page.getByTestId('team-home').waitFor();
    await page.getByTestId('configurations-table').waitFor();
    await check('team-home');
    await page.getByTestId('nav-members').click();
    await page.getByTestId('members-table').waitFor();
    await check('members');
    await page.getByTestId('nav-home').click();
    await page.locator('a[href*="/chips/"]').first().click();
    await page.getByTestId('chip-detail').waitFor();
    await page.locator('[data-testid="mesh-canvas"]').first().waitFor();
    await check('chip');
    await page.goto(`${server.url}/no/such/page`);
    await page.getByText(/not found/i).first().waitFor();
    await check('not-found');
  });

  for (const theme of ['light', 'dark'] as const) {
    it(`has none in the configuration workspace (${theme}), on each of its tabs`, async () => {
      await page.goto(`${server.url}/t/kestrel-vale`);
      await setTheme(theme);
      await page.getByRole('link', { name: 'Interferer notch' }).click();
      await page.getByTestId('configuration-workspace').waitFor();
      await page.locator('[data-testid="trace-0"]').first().waitFor({ timeout: 60_000 });
      await check(`workspace-design-${theme}`);
      await page.getByRole('tab', { name: 'Gates' }).click();
      await page.getByTestId('gate-table').waitFor();
      await check(`workspace-gates-${theme}`);
      await page.getByRole('tab', { name: /Versions/ }).click();
      await page.getByTestId('version-history').waitFor();
      await check(`workspace-versions-${theme}`);
      for (const [tab, ready] of [['Review', 'review-panel'], ['Bench', 'total-power'], ['Measured', 'measured-drop-zone'], ['Yield', 'yield-panel']] as const) {
        await page.getByRole('tab', { name: tab }).click();
        await page.getByTestId(ready).first().waitFor({ timeout: 60_000 });
        await check(`workspace-${tab.toLowerCase()}-${theme}`);
      }
    });
  }

  it('has none on a 390 px phone, where the navbar wraps instead of overflowing', async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${server.url}/t/kestrel-vale`);
    await page.getByTestId('team-home').waitFor();
    const overflow = await page.evaluate('document.documentElement.scrollWidth - document.documentElement.clientWidth');
    expect(overflow).toBeLessThanOrEqual(0);
    await check('phone-team-home');
    await page.getByRole('link', { name: 'Interferer notch' }).click();
    await page.getByTestId('configuration-workspace').waitFor();
    await page.locator('[data-testid="trace-0"]').first().waitFor({ timeout: 60_000 });
    const plotHeight = (await page.evaluate(`document.querySelector('[data-testid="trace-0"]').ownerSVGElement.getBoundingClientRect().height`)) as number;
    expect(plotHeight).toBeGreaterThan(150);
    await check('phone-workspace');
    await page.setViewportSize({ width: 1280, height: 800 });
  });
});

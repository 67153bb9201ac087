// Browser test of the foundation: sign in through the local identity provider as a demo designer,
// see the team home with the demo chip, open a configuration and its response plot, open the members page,
// sign out — against the real server and database.
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, SCREENSHOT_DIR } from './support/launch-browser.js';
import { startServer, type RunningServer } from './support/start-server.js';

let server: RunningServer;
let browser: BrowserContext;
let page: Page;

const shot = (name: string): Promise<Buffer> => page.screenshot({ path: join(SCREENSHOT_DIR, `foundation-${name}.png`), fullPage: true });

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  page = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('a demo designer in the browser', () => {
  it('is sent to the sign-in page when not signed in', async () => {
    await page.goto(`${server.url}/`);
    await page.getByTestId('signin-button').waitFor();
    expect(new URL(page.url()).pathname).toBe('/signin');
    await shot('1-signin');
  });

  it('signs in through the local identity provider and lands on the team home', async () => {
    await page.getByTestId('signin-button').click();
    await page.getByTestId('account-noor').waitFor();
    await shot('2-authorize');
    await page.getByTestId('account-noor').click();
    await page.getByTestId('team-home').waitFor();
    expect(new URL(page.url()).pathname).toBe('/t/kestrel-vale');
    expect(await page.locator('h1').first().textContent()).toContain('Kestrel Vale RF Photonics');
    expect(await page.getByTestId('team-home').textContent()).toMatch(/designer/i);
    await shot('3-team-home');
  });

  it("sees the demo chip on the team home with its three configurations and their review status", async () => {
    const table = page.getByTestId('configurations-table');
    await table.waitFor();
    const text = (await table.textContent()) ?? '';
    for (const name of ['Beam-steering delay set', 'Interferer notch', 'Downlink channel band-pass']) expect(text).toContain(name);
    for (const status of ['approved', 'in review', 'changes requested']) expect(text).toContain(status);
    await shot('3b-chips');
  });

  it('opens a configuration and sees the simulated response of its circuit', async () => {
    await page.getByRole('link', { name: 'Interferer notch' }).click();
    await page.getByTestId('configuration-workspace').waitFor();
    const trace = page.getByTestId('trace-0').first();
    await trace.waitFor({ timeout: 60_000 });
    // 1,024 simulated points, every one finite: one move and 1,023 line segments.
    expect(((await trace.getAttribute('d')) ?? '').match(/L/g)?.length).toBe(1023);
    expect(await page.title()).toContain('Interferer notch');
    await shot('3c-configuration');
    await page.getByTestId('nav-home').click();
    await page.getByTestId('team-home').waitFor();
  });

  it('opens the members page and sees every demo member with their role', async () => {
    await page.getByTestId('nav-members').click();
    await page.getByTestId('members-table').waitFor();
    await page.getByText('Ilse Marrow').first().waitFor();
    const table = (await page.getByTestId('members-table').textContent()) ?? '';
    for (const name of ['Ilse Marrow', 'Noor Halvorsen', 'Caspar Iyengar', 'Maelle Quist']) expect(table).toContain(name);
    expect(table).toMatch(/reviewer/);
    await shot('4-members');
  });

  it('signs out and is no longer signed in', async () => {
    await page.getByTestId('signout-button').click();
    await page.getByTestId('signin-button').waitFor();
    await shot('5-signed-out');
    const me = await page.request.get(`${server.url}/api/me`);
    expect(me.status()).toBe(401);
  });

  it('shows the 404 page for an unknown address', async () => {
    await page.goto(`${server.url}/no/such/page`);
    await page.getByTestId('not-found').waitFor();
    await shot('6-not-found');
  });
});

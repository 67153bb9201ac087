// The configuration workspace in a real browser against the real server: a designer opens the demo chip, synthesises a
// second-order band-pass between two free ports from the form, sees it on the canvas and its response with the mask,
// drags a coupling slider and sees the plot change, saves version N+1 and finds it again after a reload.
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addBandPass } from './support/add-band-pass.js';
import { launchBrowser, SCREENSHOT_DIR } from './support/launch-browser.js';
import { startServer, type RunningServer } from './support/start-server.js';

let server: RunningServer;
let browser: BrowserContext;
let page: Page;
let workspaceUrl = '';
let traceBeforeTuning = '';

const shot = (name: string): Promise<Buffer> => page.screenshot({ path: join(SCREENSHOT_DIR, `workspace-${name}.png`), fullPage: true });
const trace = () => page.getByTestId('trace-0').first();

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  page = await browser.newPage();
  page.setDefaultTimeout(30_000);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('a designer in the configuration workspace', () => {
  it('signs in and opens the demo chip: the mesh drawn with its ports by name', async () => {
    await page.goto(`${server.url}/`);
    await page.getByTestId('signin-button').click();
    await page.getByTestId('account-noor').click();
    await page.getByTestId('team-home').waitFor();
    await page.locator('a[href*="/chips/"]').first().click();
    await page.getByTestId('chip-detail').waitFor();
    const canvas = page.getByTestId('mesh-canvas').first();
    await canvas.waitFor();
    expect(await canvas.locator('[data-gate-id]').count()).toBeGreaterThan(200);
    expect(await canvas.textContent()).toContain('W11');
    expect(await page.title()).toContain('Kestrel Vale ground-terminal mesh');
    await shot('1-chip');
  });

  it('opens a configuration and sees the chip, its circuit and the response simulated in the browser', async () => {
    await page.goto(`${server.url}/t/kestrel-vale`);
    await page.getByRole('link', { name: 'Interferer notch' }).click();
    await page.getByTestId('configuration-workspace').waitFor();
    await trace().waitFor({ timeout: 60_000 });
    workspaceUrl = page.url().split('?')[0]!;
    expect(await page.getByTestId('circuits-list').textContent()).toContain('W03 → E03');
    await shot('2-workspace');
  });

  it('synthesises a second-order band-pass between two free ports from the form', async () => {
    await addBandPass(page, 'bandpass2', async () => {
      expect(await page.getByTestId('realised-lengths').textContent()).toMatch(/FSR/);
      await shot('4-proposal');
    });
  });

  it('sees the new circuit on the canvas and its response with the mask', async () => {
    expect(await page.getByTestId('circuits-list').textContent()).toContain('bandpass2');
    expect(await page.getByTestId('mesh-legend').locator('[data-circuit="bandpass2"]').count()).toBe(1);
    await page.getByTestId('tuning-panel').waitFor();
    await trace().waitFor({ timeout: 60_000 });
    // The plot shows the old circuit's outputs until the worker answers for the new ones.
    await page.getByTestId('workspace-response').getByText(/W11 → E11/).first().waitFor({ timeout: 60_000 });
    expect(await page.locator('[data-testid^="mask-"]').count()).toBeGreaterThan(0);
    traceBeforeTuning = (await trace().getAttribute('d')) ?? '';
    await shot('5-circuit');
  });

  it('drags a coupling slider and sees the plotted response change', async () => {
    const knob = page.locator('[data-testid^="knob-kappa-"]').first();
    const handle = knob.locator('.bp6-slider-handle');
    await handle.scrollIntoViewIfNeeded();
    const box = (await handle.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    for (let dx = 10; dx <= 60; dx += 10) await page.mouse.move(box.x + box.width / 2 + dx, box.y + box.height / 2);
    await page.mouse.up();
    await expect.poll(async () => (await trace().getAttribute('d')) ?? '', { timeout: 30_000 }).not.toBe(traceBeforeTuning);
    await shot('6-tuned');
  });

  it('saves version 3 with a note and finds it after a reload', async () => {
    await page.getByTestId('save-version').click();
    await page.getByTestId('version-note').fill('second-order band-pass next to the notch, coupling tuned by hand');
    await page.getByTestId('confirm-save').click();
    await page.waitForURL(/\?v=3$/);
    await page.reload();
    await page.getByTestId('configuration-workspace').waitFor();
    expect(page.url()).toBe(`${workspaceUrl}?v=3`);
    expect(await page.getByTestId('circuits-list').textContent()).toContain('bandpass2');
    await page.getByRole('tab', { name: /Versions/ }).click();
    expect(await page.getByTestId('history-version-3').textContent()).toContain('second-order band-pass next to the notch');
    await shot('7-saved');
    await page.getByRole('tab', { name: 'Design' }).click();
    await page.setViewportSize({ width: 1920, height: 1080 });
    await trace().waitFor({ timeout: 60_000 });
    await shot('8-wide');
  });
});

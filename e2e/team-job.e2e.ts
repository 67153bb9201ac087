// The whole job as two people in two browsers against the real server: a designer synthesises and saves, asks for a
// review; a reviewer comments on a gate and approves; the designer downloads the bench CSV (saved, parsed, its
// checksum checked against RFC 8785 canonical JSON), uploads a measured CSV and sees the overlay and residuals, runs a
// 200-run yield study to 100 %; the owner reads the review mail in the outbox; a viewer sees pages but no write control.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { canonicalJson } from '@hexloom/bench';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addBandPass } from './support/add-band-pass.js';
import { launchBrowser, SCREENSHOT_DIR } from './support/launch-browser.js';
import { startServer, type RunningServer } from './support/start-server.js';

let server: RunningServer;
const browsers: BrowserContext[] = [];
let designer: Page;
let reviewer: Page;
let workspaceUrl = '';

const shot = (page: Page, name: string): Promise<Buffer> => page.screenshot({ path: join(SCREENSHOT_DIR, `team-job-${name}.png`), fullPage: true });

async function signedIn(login: string): Promise<Page> {
  const browser = await launchBrowser();
  browsers.push(browser);
  const page = await browser.newPage();
  page.setDefaultTimeout(30_000);
  await page.goto(`${server.url}/`);
  await page.getByTestId('signin-button').click();
  await page.getByTestId(`account-${login}`).click();
  await page.getByTestId('team-home').waitFor();
  return page;
}

beforeAll(async () => {
  server = await startServer();
  designer = await signedIn('noor');
}, 180_000);

afterAll(async () => {
  for (const b of browsers) await b.close();
  await server?.stop();
});

describe('a designer and a reviewer take a filter to the bench', () => {
  it('the designer synthesises a band-pass next to the notch, saves v3 and asks Caspar to review it', async () => {
    await designer.getByRole('link', { name: 'Interferer notch' }).click();
    await designer.getByTestId('trace-0').first().waitFor({ timeout: 60_000 });
    workspaceUrl = designer.url().split('?')[0]!;
    await addBandPass(designer, 'bandpass2');
    await designer.getByTestId('save-version').click();
    await designer.getByTestId('version-note').fill('band-pass for the downlink next to the notch');
    await designer.getByTestId('confirm-save').click();
    await designer.waitForURL(/\?v=3$/);
    await designer.getByRole('tab', { name: 'Review' }).click();
    await designer.getByRole('checkbox', { name: /Caspar Iyengar/ }).check({ force: true });
    await designer.getByRole('button', { name: 'Request review of v3' }).click();
    await designer.getByText(/caspar/i).first().waitFor();
    await shot(designer, '1-review-requested');
  });

  it('the reviewer finds it waiting, comments on a gate and approves v3', async () => {
    reviewer = await signedIn('caspar');
    const waiting = reviewer.getByRole('link', { name: /Interferer notch/ }).filter({ hasText: /v3/ });
    await waiting.first().waitFor();
    await shot(reviewer, '2a-waiting-for-review');
    await waiting.first().click();
    await reviewer.waitForURL(/\?v=3$/);
    await reviewer.getByTestId('configuration-workspace').waitFor();
    const gate = reviewer.getByTestId('mesh-canvas').locator('[data-gate-id][role="button"]').nth(40);
    const gateId = (await gate.getAttribute('data-gate-id'))!;
    await gate.click();
    await reviewer.getByRole('tab', { name: 'Review' }).click();
    // Blueprint draws its own radio over a hidden input: click the label, as a person does.
    await reviewer.getByText(`The selected gate, ${gateId}`, { exact: true }).click();
    expect(await reviewer.getByRole('radio', { name: `The selected gate, ${gateId}` }).isChecked()).toBe(true);
    await reviewer.getByRole('textbox', { name: 'New comment' }).fill('@noor is this gate parked on purpose?');
    await reviewer.getByRole('button', { name: 'Comment', exact: true }).click();
    await reviewer.getByText('is this gate parked on purpose?').waitFor();
    await reviewer.getByRole('button', { name: 'Approve v3' }).click();
    await reviewer.getByTestId('approval-line').filter({ hasText: /Approved v3 by Caspar/ }).waitFor();
    await shot(reviewer, '2-approved');
  });

  it('the designer downloads the bench CSV and its checksum matches the canonical JSON export', async () => {
    await designer.reload();
    await designer.getByRole('tab', { name: 'Bench' }).click();
    await designer.getByText('Checksum verified').waitFor();
    await designer.getByRole('checkbox', { name: /I have read these cautions/ }).check({ force: true });
    const [download] = await Promise.all([designer.waitForEvent('download'), designer.getByRole('button', { name: /^Download CSV/ }).click()]);
    const path = join(SCREENSHOT_DIR, '..', `team-job-${download.suggestedFilename()}`);
    await download.saveAs(path);
    const csv = readFileSync(path, 'utf8');
    const header = Object.fromEntries(csv.split('\n').filter((l) => l.startsWith('# ') && l.includes(': ')).map((l) => [l.slice(2, l.indexOf(': ')), l.slice(l.indexOf(': ') + 2)]));
    expect(header['approval']).toBe('approved');
    const json = (await (await designer.request.get(`${server.url}/api${new URL(workspaceUrl).pathname.replace('/t/kestrel-vale', `/teams/${await teamId(designer)}`)}/versions/3/bench-export`)).json()) as { checksum: string; drives: unknown[] };
    const { checksum, ...body } = json;
    // RFC 8785 (JSON Canonicalization Scheme) form, hashed with SHA-256 (FIPS 180-4) by Node's own crypto.
    expect(createHash('sha256').update(canonicalJson(body)).digest('hex')).toBe(checksum);
    expect(header['checksum_sha256']).toBe(checksum);
    const rows = csv.split('\n').filter((l) => l && !l.startsWith('#')).slice(1);
    expect(rows).toHaveLength(json.drives.length);
    await shot(designer, '3-bench');
    await designer.getByRole('tab', { name: /Versions/ }).click();
    await designer.getByTestId('versions-panel').waitFor();
    await designer.getByText(/gates? changed/).first().waitFor({ timeout: 60_000 });
    await shot(designer, '3a-diff');
  });

  it('the designer uploads a measured CSV and sees it over the simulation with the residuals', async () => {
    await designer.getByRole('tab', { name: 'Measured' }).click();
    // An invented bench sweep: a flat -18 dB line with a small ripple, 41 points over +-2 GHz.
    const lines = ['frequency_hz,amplitude_db', ...Array.from({ length: 41 }, (_, i) => `${193.4e12 + (i - 20) * 1e8},${(-18 + 0.3 * Math.sin(i / 3)).toFixed(3)}`)];
    await designer.getByTestId('measured-drop-zone').locator('input[type="file"]').setInputFiles({ name: 'sweep.csv', mimeType: 'text/csv', buffer: Buffer.from(`${lines.join('\n')}\n`) });
    await designer.getByTestId('measured-preview').waitFor();
    await designer.locator('#hx-measured-label').fill('bench sweep, day 1');
    await designer.getByRole('button', { name: 'Save measurement' }).click();
    await designer.getByTestId('comparison-chart').waitFor({ timeout: 60_000 });
    await designer.getByTestId('trace-measured').waitFor();
    expect(await designer.getByText('RMS residual').count()).toBeGreaterThan(0);
    await shot(designer, '4-measured');
  });

  it('the designer runs a 200-run yield study and sees the progress bar reach 100 %', async () => {
    await designer.getByRole('tab', { name: 'Yield' }).click();
    await designer.locator('#yield-runs').fill('200');
    await designer.getByRole('button', { name: 'Start the yield study' }).click();
    await designer.getByTestId('yield-progress').waitFor();
    await designer.getByText(/Done: 200 of 200 runs \(100 %\)/).waitFor({ timeout: 120_000 });
    await designer.getByTestId('yield-result').waitFor();
    await shot(designer, '5-yield');
  });

  it('the owner reads the review mail in the outbox', async () => {
    const owner = await signedIn('ilse');
    await owner.getByTestId('nav-outbox').click();
    await owner.getByTestId('outbox').waitFor();
    const item = owner.getByTestId('outbox-item').filter({ hasText: /review/i }).first();
    await item.click();
    expect(await owner.getByTestId('outbox-body').textContent()).toMatch(/Interferer notch/);
    await shot(owner, '6-outbox');
  });

  it('a viewer sees the workspace and its tabs but no control that writes', async () => {
    const viewer = await signedIn('dario');
    await viewer.goto(`${workspaceUrl}?v=3`);
    await viewer.getByTestId('configuration-workspace').waitFor();
    expect(await viewer.getByTestId('save-version').count()).toBe(0);
    expect(await viewer.getByTestId('new-circuit').count()).toBe(0);
    await viewer.getByRole('tab', { name: 'Review' }).click();
    expect(await viewer.getByRole('button', { name: /Approve|Request review|^Comment$/ }).count()).toBe(0);
    await viewer.getByRole('tab', { name: 'Measured' }).click();
    expect(await viewer.getByRole('button', { name: 'Save measurement' }).count()).toBe(0);
    await viewer.getByRole('tab', { name: 'Yield' }).click();
    expect(await viewer.getByRole('button', { name: 'Start the yield study' }).count()).toBe(0);
    await shot(viewer, '7-viewer');
  });
});

/** The team's id, read through the signed-in page's own session. */
async function teamId(page: Page): Promise<string> {
  const teams = (await (await page.request.get(`${server.url}/api/teams`)).json()) as { id: string }[];
  return teams[0]!.id;
}

// Screenshots of the built web app (served by `vite preview`) with /api mocked, in both themes.
// Usage: node scripts/screenshots.mjs [baseUrl] [outDir]   (needs /usr/bin/chromium)
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';

const baseUrl = process.argv[2] ?? 'http://localhost:4173';
const outDir = process.argv[3] ?? join(import.meta.dirname, '../../../.artifacts/web');
const teamId = '5b0c3a52-8d0e-4c61-9a7e-1f2d3c4b5a69';
const uid = (n) => `0f6a1c2e-${String(n).padStart(4, '0')}-4a8b-9c3d-2e4f6a8b0c1d`;
const people = [
  ['ilse', 'Ilse Marrow', 'owner'], ['oskar', 'Oskar Penhaligon', 'owner'], ['noor', 'Noor Halvorsen', 'designer'],
  ['tobin', 'Tobin Achterberg', 'designer'], ['caspar', 'Caspar Iyengar', 'reviewer'], ['wen', 'Wen Lathrop', 'reviewer'],
  ['dario', 'Dario Fennimore', 'viewer'], ['maelle', 'Maelle Quist', 'viewer'],
];
const members = people.map(([login, name, role], i) => ({
  userId: uid(i + 1), login, name, email: `${login}@kestrel-vale.example`, role, joinedAt: `2026-0${1 + (i % 8)}-1${i}T09:00:00.000Z`,
}));
const me = {
  user: { id: uid(1), login: 'ilse', name: 'Ilse Marrow', email: 'ilse@kestrel-vale.example', avatarUrl: null },
  teams: [
    { id: teamId, slug: 'kestrel-vale', name: 'Kestrel Vale RF Photonics', role: 'owner' },
    { id: uid(99), slug: 'harrow-bench', name: 'Harrow Bench Group', role: 'viewer' },
  ],
};
const invitations = [
  { id: uid(50), email: 'rhea@kestrel-vale.example', role: 'reviewer', invitedBy: 'ilse', createdAt: '2026-04-02T08:00:00.000Z', acceptedAt: null },
];
const answers = {
  'GET /api/auth/providers': { provider: 'local' },
  'GET /api/me': me,
  [`GET /api/teams/${teamId}/members`]: members,
  [`GET /api/teams/${teamId}/invitations`]: invitations,
};

const context = await chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'hexloom-shot-')), {
  executablePath: '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
    '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  viewport: { width: 1280, height: 860 },
});
await context.route('**/api/**', async (route) => {
  const url = new URL(route.request().url());
  const key = `${route.request().method()} ${url.pathname}`;
  const body = answers[key];
  if (body === undefined) {
    await route.fulfill({ status: 404, json: { statusCode: 404, error: 'Not Found', message: `No mock for ${key}` } });
  } else {
    await route.fulfill({ status: 200, json: body });
  }
});
const page = context.pages()[0] ?? (await context.newPage());
const errors = [];
page.on('console', (msg) => { if (msg.type() === 'error' || msg.type() === 'warning') errors.push(`${msg.text()} ${msg.location().url}`); });
page.on('pageerror', (err) => errors.push(String(err)));

for (const theme of ['light', 'dark']) {
  await page.goto(`${baseUrl}/signin`);
  await page.evaluate((t) => window.localStorage.setItem('hexloom.theme', t), theme);
  for (const [name, path, testId] of [
    ['signin', '/signin', 'signin-button'],
    ['team-home', '/t/kestrel-vale', 'team-home'],
    ['members', '/t/kestrel-vale/members', 'members-table'],
    ['not-found', '/nowhere', 'not-found'],
  ]) {
    await page.goto(`${baseUrl}${path}`);
    await page.getByTestId(testId).waitFor();
    await page.waitForTimeout(400);
    await page.screenshot({ path: join(outDir, `${name}-${theme}.png`), fullPage: true });
  }
}
console.log(errors.length ? `console:\n${errors.join('\n')}` : 'no console errors');
await context.close();

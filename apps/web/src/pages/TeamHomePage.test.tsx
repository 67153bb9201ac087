// The root redirect and the team home: first team, its name, the user's role and what to do next.
import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CONFIGURATION_ID, demoChipRoutes } from '../test/demoChip.js';
import { DEMO_TEAM_ID, demoMe } from '../test/demoTeam.js';
import { mockApi } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

describe('TeamHomePage', () => {
  it('opens the first team from / and shows its name, the role, the next steps and, for a designer, New chip', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, [`GET /api/teams/${DEMO_TEAM_ID}/chips`]: { body: [] }, [`GET /api/teams/${DEMO_TEAM_ID}/reviews/waiting`]: { body: [] } });
    const { router } = renderApp('/');
    const home = await screen.findByTestId('team-home');
    expect(router.state.location.pathname).toBe('/t/kestrel-vale');
    expect(within(home).getByRole('heading', { level: 1 }).textContent).toBe('Kestrel Vale RF Photonics');
    expect(within(home).getByTestId('role-tag').textContent).toBe('designer');
    expect(await within(home).findByText(/Describe the chip/)).toBeTruthy();
    expect(within(home).getAllByRole('button').map((b) => b.textContent)).toEqual(['New chip']);
    expect(screen.getByTestId('nav-members').getAttribute('href')).toBe('/t/kestrel-vale/members');
  });

  it("lists the team's chips with each configuration's latest version and review status", async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, ...demoChipRoutes });
    renderApp('/t/kestrel-vale');
    const table = await screen.findByTestId('configurations-table');
    expect(screen.getByTestId('chip-card').textContent).toContain('12 x 8 cells');
    expect(table.textContent).toContain('Interferer notch');
    expect(within(table).getByTestId('status-tag').textContent).toBe('in review');
    expect(within(table).getByRole('link', { name: 'Interferer notch' }).getAttribute('href')).toBe(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
  });

  it('shows the team switcher only when the user is in several teams', async () => {
    const me = demoMe('ilse', 'owner');
    me.teams.push({ id: DEMO_TEAM_ID.replace('5b0c', '6c1d'), slug: 'harrow-bench', name: 'Harrow Bench Group', role: 'viewer' });
    mockApi({ 'GET /api/me': { body: me } });
    renderApp('/t/harrow-bench');
    await screen.findByTestId('team-home');
    const switcher = screen.getByRole('combobox', { name: 'Switch team' }) as HTMLSelectElement;
    expect(switcher.value).toBe('harrow-bench');
    expect(Array.from(switcher.options).map((o) => o.value)).toEqual(['kestrel-vale', 'harrow-bench']);
  });

  it('answers an unknown path with the not-found page', async () => {
    mockApi({});
    renderApp('/no/such/page');
    expect((await screen.findByTestId('not-found')).textContent).toContain('Page not found');
  });
});

// The configuration page: versions with their status, the circuit picker and the plotted response.
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CONFIGURATION_ID, demoChipRoutes } from '../test/demoChip.js';
import { demoMe } from '../test/demoTeam.js';
import { mockApi } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

describe('ConfigurationPage', () => {
  it('shows the versions newest first, simulates the head version and plots transmission and group delay', async () => {
    const calls = mockApi({ 'GET /api/me': { body: demoMe('dario', 'viewer') }, ...demoChipRoutes });
    renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    const plot = await screen.findByTestId('response-plot');
    const rows = within(screen.getByTestId('versions-table')).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.textContent?.slice(0, 2))).toEqual(['v2', 'v1']);
    const simulate = calls.find((c) => c.key.endsWith('/versions/2/simulate'));
    expect(simulate?.body).toMatchObject({ from: 'v(0,0)n/g(0,0)ne', to: 'v(1,0)n/g(1,0)ne', grid: { kind: 'span' } });
    // Both panels draw a line through every finite point (5 points -> "M" + 4 "L").
    for (const id of ['plot-amplitude', 'plot-delay']) {
      const d = within(plot).getByTestId(id).querySelector('path')?.getAttribute('d') ?? '';
      expect(d.startsWith('M')).toBe(true);
      expect(d.match(/L/g)).toHaveLength(4);
    }
    expect(screen.getByTestId('circuit-figures').textContent).toContain('notchDepthDb');
  });

  it('loads an older version when its row is clicked', async () => {
    const calls = mockApi({ 'GET /api/me': { body: demoMe('dario', 'viewer') }, ...demoChipRoutes });
    renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    await screen.findByTestId('response-plot');
    fireEvent.click(screen.getByTestId('version-1'));
    await waitFor(() => expect(calls.some((c) => c.key.endsWith('/versions/1'))).toBe(true));
  });
});

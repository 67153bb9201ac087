// "New chip" on the team home: for designers only; a template or a chip JSON file creates the chip and opens its page.
import { fireEvent, screen, waitFor } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CHIP_ID, demoChip } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID, demoMe } from '../../../test/demoTeam.js';
import { mockApi } from '../../../test/mockApi.js';
import { renderApp } from '../../../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

const CHIPS = `/api/teams/${DEMO_TEAM_ID}/chips`;
const routes = (role: 'designer' | 'viewer') => ({
  'GET /api/me': { body: demoMe(role === 'designer' ? 'noor' : 'dario', role) },
  [`GET ${CHIPS}`]: { body: [demoChip] },
  [`GET ${CHIPS}/${DEMO_CHIP_ID}/configurations`]: { body: [] },
  [`GET ${CHIPS}/${DEMO_CHIP_ID}`]: { body: demoChip },
  [`POST ${CHIPS}`]: { status: 201, body: demoChip },
  [`POST ${CHIPS}/import`]: { status: 201, body: demoChip },
});

describe('NewChipDialog', () => {
  it('links each chip card to its chip page and shows no New chip button to a viewer', async () => {
    mockApi(routes('viewer'));
    renderApp('/t/kestrel-vale');
    const link = await screen.findByRole('link', { name: 'Demo mesh (invented)' });
    expect(link.getAttribute('href')).toBe(`/t/kestrel-vale/chips/${DEMO_CHIP_ID}`);
    expect(screen.queryByRole('button', { name: 'New chip' })).toBeNull();
  });

  it('refuses a template without a name or with too many rows, sending nothing', async () => {
    const calls = mockApi(routes('designer'));
    renderApp('/t/kestrel-vale');
    fireEvent.click(await screen.findByRole('button', { name: 'New chip' }));
    fireEvent.change(screen.getByLabelText('Rows'), { target: { value: '41' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create chip' }));
    expect(await screen.findByText('Give the chip a name')).toBeTruthy();
    expect(screen.getByText('Must be at most 40')).toBeTruthy();
    expect(calls.some((c) => c.key.startsWith('POST'))).toBe(false);
  });

  it('creates a rectangle from the template with the demo technology and opens the new chip', async () => {
    const calls = mockApi(routes('designer'));
    const { router } = renderApp('/t/kestrel-vale');
    fireEvent.click(await screen.findByRole('button', { name: 'New chip' }));
    fireEvent.change(screen.getByLabelText('Chip name'), { target: { value: 'Bench mesh B' } });
    fireEvent.change(screen.getByLabelText('Rows'), { target: { value: '8' } });
    fireEvent.change(screen.getByLabelText('Columns'), { target: { value: '12' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create chip' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/t/kestrel-vale/chips/${DEMO_CHIP_ID}`));
    const body = calls.find((c) => c.key === `POST ${CHIPS}`)?.body as { name: string; template: object; technology: { unitLengthUm: number } };
    expect(body.name).toBe('Bench mesh B');
    expect(body.template).toEqual({ rows: 8, columns: 12, io: 'left-right' });
    expect(body.technology.unitLengthUm).toBe(650);
  });

  it('creates a hexagon as a full definition built in the browser', async () => {
    const calls = mockApi(routes('designer'));
    renderApp('/t/kestrel-vale');
    fireEvent.click(await screen.findByRole('button', { name: 'New chip' }));
    fireEvent.change(screen.getByLabelText('Chip name'), { target: { value: 'Hex two' } });
    fireEvent.change(screen.getByLabelText('Shape'), { target: { value: 'hexagon' } });
    fireEvent.change(screen.getByLabelText(/Radius/), { target: { value: '2' } });
    fireEvent.click(screen.getByRole('button', { name: 'Create chip' }));
    await waitFor(() => expect(calls.some((c) => c.key === `POST ${CHIPS}`)).toBe(true));
    const body = calls.find((c) => c.key === `POST ${CHIPS}`)?.body as { definition: { name: string; shape: object; ports: unknown[] } };
    expect(body.definition.name).toBe('Hex two');
    expect(body.definition.shape).toEqual({ kind: 'hexagon', radius: 2 });
    expect(body.definition.ports.length).toBeGreaterThan(0);
  });

  it('gives every control of both sides of the dialog an accessible name (axe; contrast is left to the browser)', async () => {
    mockApi(routes('designer'));
    renderApp('/t/kestrel-vale');
    fireEvent.click(await screen.findByRole('button', { name: 'New chip' }));
    fireEvent.click(screen.getByRole('button', { name: /Technology profile/ }));
    const dialog = screen.getByRole('dialog');
    const violations = async () => (await axe.run(dialog, { rules: { 'color-contrast': { enabled: false } } })).violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`);
    expect(await violations()).toEqual([]);
    fireEvent.click(screen.getByLabelText('A chip JSON file'));
    expect(await violations()).toEqual([]);
  }, 120_000);

  it('uploads a chip JSON file to the import route', async () => {
    const calls = mockApi(routes('designer'));
    const { router } = renderApp('/t/kestrel-vale');
    fireEvent.click(await screen.findByRole('button', { name: 'New chip' }));
    fireEvent.click(screen.getByLabelText('A chip JSON file'));
    fireEvent.change(screen.getByLabelText(/Chip JSON/), { target: { files: [new File(['{}'], 'mesh.json', { type: 'application/json' })] } });
    fireEvent.click(screen.getByRole('button', { name: 'Create chip' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/t/kestrel-vale/chips/${DEMO_CHIP_ID}`));
    expect(calls.filter((c) => c.key === `POST ${CHIPS}/import`)).toHaveLength(1);
  });
});

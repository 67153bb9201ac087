// The configuration workspace page: versions, the canvas, the live response (in-thread solver under jsdom), gate
// edits with undo, and saving as a new version (201, and a 409 that keeps the edits).
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ringNotchContent } from '../modules/response/testing/ringNotchContent.js';
import { DEMO_CONFIGURATION_ID, demoChipRoutes, demoDetail, demoVersion } from '../test/demoChip.js';
import { DEMO_TEAM_ID, demoMe } from '../test/demoTeam.js';
import { mockApi } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

const base = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`;
const content = ringNotchContent();
const version2 = { ...demoVersion, content };
const routes = { ...demoChipRoutes, [`GET ${base}/versions/2`]: { body: version2 }, [`GET ${base}/versions/1`]: { body: { ...version2, id: demoDetail.versions[0]!.id, number: 1, status: 'changes_requested' } } };
const gateOfNotch = content.gates.find((g) => g.circuit === 'notch')!.gate;

describe('ConfigurationPage', () => {
  it("draws the chip and the head version's response, with figures in words, and no write control for a viewer", async () => {
    mockApi({ 'GET /api/me': { body: demoMe('dario', 'viewer') }, ...routes });
    renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    const trace = await screen.findByTestId('trace-0', {}, { timeout: 10_000 });
    expect((trace.getAttribute('d') ?? '').startsWith('M')).toBe(true);
    expect(screen.getByTestId('circuits-list').textContent).toContain('in → out');
    const figures = screen.getByTestId('circuit-figures').textContent ?? '';
    expect(figures).toContain('Notch depth below the off-resonance level19.5 dB');
    expect(figures).not.toMatch(/notchDepthDb|e\+/);
    expect(screen.queryByTestId('save-version')).toBeNull();
    expect(screen.queryByTestId('new-circuit')).toBeNull();
    expect(document.title).toBe('Interferer notch v2 · Hexloom');
  });

  it('edits a gate from the canvas, undoes it, and saves the draft as version 3 with a note', async () => {
    const calls = mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, ...routes, [`POST ${base}/versions`]: { status: 201, body: { ...version2, id: '1e5f6a7b-8c9d-4e0f-8a1b-3c4d5e6f7a8b', number: 3, status: 'draft' } } });
    const { router } = renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    await screen.findByTestId('trace-0', {}, { timeout: 10_000 });
    fireEvent.click(screen.getByRole('button', { name: new RegExp(`^gate ${gateOfNotch.replace(/[()]/g, '\\$&')},`) }));
    const inspector = await screen.findByTestId('gate-inspector');
    fireEvent.click(within(inspector).getByRole('radio', { name: 'Cross' }));
    expect(screen.getByTestId('unsaved')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Undo (Ctrl+Z)' }));
    expect(screen.queryByTestId('unsaved')).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Redo (Ctrl+Shift+Z)' }));
    fireEvent.click(screen.getByTestId('save-version'));
    fireEvent.change(await screen.findByTestId('version-note'), { target: { value: 'coupler to cross' } });
    fireEvent.click(screen.getByTestId('confirm-save'));
    await waitFor(() => expect(router.state.location.search).toBe('?v=3'));
    const save = calls.find((c) => c.key === `POST ${base}/versions`)!.body as { baseVersion: number; note: string; content: typeof content };
    expect(save.baseVersion).toBe(2);
    expect(save.note).toBe('coupler to cross');
    expect(save.content.gates.find((g) => g.gate === gateOfNotch)?.state).toBe('cross');
  });

  it('keeps the edits and offers the newer version when the save is stale (409)', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, ...routes, [`POST ${base}/versions`]: { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'Version 3 was saved after version 2: your save is based on an old version.' } } });
    renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    await screen.findByTestId('trace-0', {}, { timeout: 10_000 });
    fireEvent.click(screen.getByRole('button', { name: new RegExp(`^gate ${gateOfNotch.replace(/[()]/g, '\\$&')},`) }));
    fireEvent.click(within(await screen.findByTestId('gate-inspector')).getByRole('radio', { name: 'Bar' }));
    fireEvent.click(screen.getByTestId('save-version'));
    fireEvent.click(await screen.findByTestId('confirm-save'));
    const stale = await screen.findByTestId('stale-save');
    expect(stale.textContent).toContain('Version 3 was saved after version 2');
    expect(screen.getByTestId('unsaved')).toBeTruthy();
  });

  it('opens an older version from its row with the keyboard, and puts it in the URL', async () => {
    const calls = mockApi({ 'GET /api/me': { body: demoMe('dario', 'viewer') }, ...routes });
    const { router } = renderApp(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}`);
    await screen.findByTestId('trace-0', {}, { timeout: 10_000 });
    fireEvent.click(screen.getByRole('tab', { name: /Versions/ }));
    fireEvent.keyDown(await screen.findByTestId('history-version-1'), { key: 'Enter' });
    await waitFor(() => expect(router.state.location.search).toBe('?v=1'));
    await waitFor(() => expect(calls.some((c) => c.key === `GET ${base}/versions/1`)).toBe(true));
  });
});

// The chip page: mesh and tabs for a designer, read-only for a viewer; technology, calibration and dead gates edits.
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Calibration, Chip } from '@hexloom/contracts';
import { DEMO_CHIP_ID, demoChip } from '../test/demoChip.js';
import { DEMO_TEAM_ID, demoMe } from '../test/demoTeam.js';
import { mockApi, type MockRoutes } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

const CHIP = `/api/teams/${DEMO_TEAM_ID}/chips/${DEMO_CHIP_ID}`;
const PAGE = `/t/kestrel-vale/chips/${DEMO_CHIP_ID}`;
const calibration: Calibration = {
  id: '1e2d3c4b-5a69-4788-9a0b-1c2d3e4f5a6b',
  chipId: DEMO_CHIP_ID,
  fileName: 'bench-3.csv',
  uploadedBy: 'noor',
  uploadedAt: '2026-11-30T11:00:00.000Z',
  shifters: [{ gate: 'g(0,0)e', shifter: 'theta', offsetRad: 0.12, piPowerW: 0.022, resistanceOhm: 1200, maxPowerW: 0.06, maxVoltageV: 9 }],
};

function chipRoutes(role: 'designer' | 'viewer', extra: MockRoutes = {}): MockRoutes {
  return { 'GET /api/me': { body: demoMe(role === 'designer' ? 'noor' : 'dario', role) }, [`GET ${CHIP}`]: { body: demoChip }, ...extra };
}

const csvFile = (lines: string[]) => new File([`${lines.join('\n')}\n`], 'bench.csv', { type: 'text/csv' });
const HEADER = 'gate,shifter,offset_rad,p_pi_mw,resistance_ohm,max_power_mw,max_voltage_v';

describe('ChipPage', () => {
  it('shows the mesh and the technology profile with units, and write controls for a designer', async () => {
    mockApi(chipRoutes('designer'));
    renderApp(PAGE);
    const page = await screen.findByTestId('chip-detail');
    expect(within(page).getByRole('heading', { level: 1 }).textContent).toBe('Demo mesh (invented)');
    expect(page.querySelectorAll('[data-gate-id]').length).toBeGreaterThan(300);
    expect((screen.getByLabelText(/Unit length/) as HTMLInputElement).value).toBe('650');
    expect((screen.getByLabelText(/Reference \(carrier\) frequency/) as HTMLInputElement).value).toBe('193.4');
    expect(screen.getByText('(THz)')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Save technology' })).toBeTruthy();
    fireEvent.click(screen.getByRole('tab', { name: 'Calibration' }));
    expect(await screen.findByTestId('calibration-drop-zone')).toBeTruthy();
    fireEvent.click(screen.getByRole('tab', { name: /Dead gates/ }));
    expect(screen.getByRole('button', { name: 'Save dead gates' })).toBeTruthy();
  });

  it('hides every write control from a viewer and keeps the fields read-only', async () => {
    mockApi(chipRoutes('viewer', { [`GET ${CHIP}/calibration`]: { body: calibration } }));
    renderApp(PAGE);
    await screen.findByTestId('chip-detail');
    expect(screen.queryByRole('button', { name: 'Save technology' })).toBeNull();
    expect((screen.getByLabelText(/Unit length/) as HTMLInputElement).readOnly).toBe(true);
    fireEvent.click(screen.getByRole('tab', { name: 'Calibration' }));
    expect((await screen.findByTestId('calibration-table')).textContent).toContain('bench-3.csv');
    expect(screen.queryByTestId('calibration-drop-zone')).toBeNull();
    fireEvent.click(screen.getByRole('tab', { name: /Dead gates/ }));
    expect(screen.queryByRole('button', { name: 'Save dead gates' })).toBeNull();
    expect(screen.queryAllByRole('button', { name: /^gate / })).toHaveLength(0);
  });

  it('shows a field error under a bad technology value and sends nothing', async () => {
    const calls = mockApi(chipRoutes('designer'));
    renderApp(PAGE);
    await screen.findByTestId('chip-detail');
    fireEvent.change(screen.getByLabelText(/Unit length/), { target: { value: '-5' } });
    fireEvent.change(screen.getByLabelText(/Heater resistance/), { target: { value: 'twelve' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save technology' }));
    expect(await screen.findByText('Must be more than 0 µm')).toBeTruthy();
    expect(screen.getByText('"twelve" is not a number')).toBeTruthy();
    expect(screen.getByLabelText(/Unit length/).getAttribute('aria-invalid')).toBe('true');
    expect(calls.some((c) => c.key.startsWith('PATCH'))).toBe(false);
  });

  it('saves a corrected profile through PATCH with the values in SI units', async () => {
    const saved: Chip = { ...demoChip, revision: 2, definition: { ...demoChip.definition, technology: { ...demoChip.definition.technology, lossPerGateDb: 0.3, referenceFrequencyHz: 193.1e12 } } };
    const calls = mockApi(chipRoutes('designer', { [`PATCH ${CHIP}`]: { body: saved } }));
    renderApp(PAGE);
    await screen.findByTestId('chip-detail');
    fireEvent.change(screen.getByLabelText(/Insertion loss per gate/), { target: { value: '0.3' } });
    fireEvent.change(screen.getByLabelText(/Reference \(carrier\) frequency/), { target: { value: '193.1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save technology' }));
    expect((await screen.findByRole('status')).textContent).toContain('revision 2');
    const patch = calls.find((c) => c.key === `PATCH ${CHIP}`)?.body as { technology: Chip['definition']['technology'] };
    expect(patch.technology.lossPerGateDb).toBe(0.3);
    expect(Math.abs(patch.technology.referenceFrequencyHz - 193.1e12)).toBeLessThan(1);
  });

  it('lists each bad calibration row with its line and sends nothing, then uploads a clean file', async () => {
    const calls = mockApi(chipRoutes('designer', { [`GET ${CHIP}/calibration`]: { status: 404, body: { statusCode: 404, error: 'Not Found', message: 'no calibration yet' } }, [`PUT ${CHIP}/calibration`]: { body: calibration } }));
    renderApp(PAGE);
    await screen.findByTestId('chip-detail');
    fireEvent.click(screen.getByRole('tab', { name: 'Calibration' }));
    expect(await screen.findByText(/No calibration uploaded yet/)).toBeTruthy();
    const zone = screen.getByTestId('calibration-drop-zone');
    fireEvent.drop(zone, { dataTransfer: { files: [csvFile(['# bench 3', HEADER, '"g(0,0)e",theta,0.12,22,1200,60,9', '"g(0,0)e",phi,0.1,0.01,1200,60,9'])] } });
    const issues = await screen.findByTestId('calibration-issues');
    expect(issues.textContent).toContain('Line 4 (p_pi_mw): 0.01 is outside 0.1 .. 1000');
    expect(screen.queryByRole('button', { name: 'Upload this calibration' })).toBeNull();
    expect(calls.some((c) => c.key.startsWith('PUT'))).toBe(false);

    fireEvent.change(screen.getByLabelText('Calibration CSV file'), { target: { files: [csvFile([HEADER, '"g(0,0)e",theta,0.12,22,1200,60,9'])] } });
    fireEvent.click(await screen.findByRole('button', { name: 'Upload this calibration' }));
    expect((await screen.findByRole('status')).textContent).toContain('1 phase shifters stored');
    expect(calls.filter((c) => c.key === `PUT ${CHIP}/calibration`)).toHaveLength(1);
  });

  it('marks gates dead by clicking them on the canvas and saves the list', async () => {
    const calls = mockApi(chipRoutes('designer', { [`PATCH ${CHIP}`]: (init) => ({ body: { ...demoChip, revision: 2, definition: { ...demoChip.definition, ...(JSON.parse(String(init?.body)) as object) } } }) }));
    renderApp(PAGE);
    await screen.findByTestId('chip-detail');
    fireEvent.click(screen.getByRole('tab', { name: /Dead gates/ }));
    const layer = screen.getByRole('group', { name: 'Mesh of Demo mesh (invented)' }).querySelector('g')!;
    fireEvent.click(screen.getByRole('button', { name: 'Zoom in' }));
    const zoomed = layer.getAttribute('transform');
    fireEvent.click(screen.getByRole('button', { name: 'gate g(2,1)e, idle' }));
    expect(layer.getAttribute('transform')).toBe(zoomed);
    fireEvent.keyDown(screen.getByRole('button', { name: 'gate g(0,0)ne, idle' }), { key: 'Enter' });
    expect(document.querySelector('[data-gate-id="g(2,1)e"]')?.getAttribute('class')).toContain('hx-mesh-gate--dead');
    expect(within(screen.getByRole('list', { name: 'Dead gates' })).getAllByRole('listitem')).toHaveLength(2);
    fireEvent.click(screen.getByRole('button', { name: 'Mark g(0,0)ne working again' }));
    fireEvent.click(screen.getByRole('button', { name: 'Save dead gates' }));
    await waitFor(() => expect(calls.find((c) => c.key === `PATCH ${CHIP}`)?.body).toEqual({ deadGates: ['g(2,1)e'] }));
    expect(await screen.findByRole('tab', { name: 'Dead gates (1)' })).toBeTruthy();
  });

  it('gives every control of every tab an accessible name (axe; contrast is left to the browser)', async () => {
    mockApi(chipRoutes('designer', { [`GET ${CHIP}/calibration`]: { body: calibration } }));
    renderApp(PAGE);
    const page = await screen.findByTestId('chip-detail');
    const violations = async () => (await axe.run(page, { rules: { 'color-contrast': { enabled: false } } })).violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`);
    expect(await violations()).toEqual([]);
    fireEvent.click(screen.getByRole('tab', { name: 'Calibration' }));
    await screen.findByTestId('calibration-table');
    expect(await violations()).toEqual([]);
    fireEvent.click(screen.getByRole('tab', { name: /Dead gates/ }));
    fireEvent.click(screen.getByRole('button', { name: 'gate g(0,0)e, idle' }));
    expect(await violations()).toEqual([]);
  }, 120_000);

  it('says so when the chip is not in the team', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') } });
    renderApp(PAGE);
    expect((await screen.findByTestId('not-found', {}, { timeout: 10_000 })).textContent).toContain('Chip not found');
  });
});

// The Bench tab: cautions before any download, drive table with its total, the 422 limits list, the checksum check.
import { screen, waitFor, within } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CHIP_ID, DEMO_CONFIGURATION_ID, demoChip } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID, demoMe } from '../../../test/demoTeam.js';
import { mockApi, type MockAnswer } from '../../../test/mockApi.js';
import { benchVersion, signedExport } from '../test/benchFixtures.js';
import { renderPanel } from '../test/renderPanel.js';
import { BenchPanel } from './BenchPanel.js';

const VERSION = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/2`;
const blobs: Blob[] = [];

beforeEach(() => {
  blobs.length = 0;
  vi.stubGlobal('URL', Object.assign(URL, { createObjectURL: vi.fn((b: Blob) => (blobs.push(b), 'blob:test')), revokeObjectURL: vi.fn() }));
});
afterEach(() => vi.unstubAllGlobals());

const routes = (benchExport: MockAnswer) => ({
  'GET /api/me': { body: demoMe('dario', 'viewer') },
  [`GET /api/teams/${DEMO_TEAM_ID}/chips/${DEMO_CHIP_ID}`]: { body: demoChip },
  [`GET ${VERSION}/bench-export`]: benchExport,
});

const renderBench = () => renderPanel(<BenchPanel teamId={DEMO_TEAM_ID} configurationId={DEMO_CONFIGURATION_ID} version={benchVersion} chipId={DEMO_CHIP_ID} />);

describe('BenchPanel', () => {
  it('shows the cautions and keeps every download disabled until they are acknowledged', async () => {
    mockApi(routes({ body: await signedExport() }));
    const { user } = renderBench();
    expect(await screen.findByText('Follow the laser safety rules of the lab (test caution two).')).toBeTruthy();
    const json = await screen.findByRole('button', { name: /^Download JSON/ });
    await waitFor(() => expect(screen.getByRole('table', { name: 'Drive values per phase shifter' })).toBeTruthy());
    const csv = screen.getByRole('button', { name: /^Download CSV/ });
    const touchstone = screen.getByRole('button', { name: 'Download Touchstone (.s2p)' });
    for (const b of [json, csv, touchstone]) expect((b as HTMLButtonElement).disabled).toBe(true);
    await user.click(json);
    expect(blobs).toHaveLength(0);

    await user.click(screen.getByRole('checkbox', { name: /I have read these cautions/ }));
    for (const b of [json, csv, touchstone]) expect((b as HTMLButtonElement).disabled).toBe(false);
    await user.click(json);
    expect(blobs).toHaveLength(1);
    expect(JSON.parse(await (blobs[0] as Blob).text())).toMatchObject({ kind: 'hexloom-bench-export', configuration: 'Interferer notch' });
    expect(await screen.findByText('Saved Interferer-notch-v2.bench.json.')).toBeTruthy();
  });

  it('sums the power of the rows into the total electrical power, with units in the headers', async () => {
    mockApi(routes({ body: await signedExport() }));
    renderBench();
    const table = await screen.findByRole('table', { name: 'Drive values per phase shifter' });
    for (const header of ['Voltage (V)', 'Current (mA)', 'Power (mW)']) expect(within(table).getByRole('columnheader', { name: header })).toBeTruthy();
    // 7.5 + 4.8 + 1.2 mW (P = V^2 / R on 1.2 kOhm, common practice).
    expect(within(table).getByTestId('total-power').textContent).toBe('13.5 mW');
    expect(within(table).getByText('2.5')).toBeTruthy(); // 3 V / 1.2 kOhm = 2.5 mA (Ohm's law, common practice)
    expect(screen.queryByText('The stated total power does not match the rows')).toBeNull();
  });

  it('warns when the stated total differs from the sum of the rows, and still shows the rows’ sum', async () => {
    mockApi(routes({ body: await signedExport({ totalPowerW: 0.02 }) }));
    renderBench();
    expect(await screen.findByText('The stated total power does not match the rows')).toBeTruthy();
    expect(screen.getByTestId('total-power').textContent).toBe('13.5 mW');
  });

  it('lists each shifter beyond its limit in words instead of the table when the server answers 422', async () => {
    mockApi(
      routes({
        status: 422,
        body: {
          statusCode: 422,
          error: 'Unprocessable Entity',
          message: '2 drive value(s) exceed their limits',
          violations: [
            { gate: 'g(0,0)ne', shifter: 'theta', quantity: 'power', value: 0.0652, limit: 0.06 },
            { gate: 'g(1,0)e', shifter: 'phi', quantity: 'voltage', value: 9.5, limit: 9 },
          ],
          cautions: ['Server caution for the refused export.'],
        },
      }),
    );
    renderBench();
    const list = await screen.findByRole('list', { name: 'Drive values beyond their limits' });
    const items = within(list).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual(['Gate g(0,0)ne, internal phase θ: heater power 65.2 mW, above the limit of 60 mW', 'Gate g(1,0)e, outer phase φ: heater voltage 9.5 V, above the limit of 9 V']);
    expect(screen.getByText('No drive values: 2 shifters exceed their limits')).toBeTruthy();
    expect(screen.getByText('Server caution for the refused export.')).toBeTruthy();
    expect(screen.queryByRole('table', { name: 'Drive values per phase shifter' })).toBeNull();
  });

  it('verifies the checksum in the browser and shows the schema version', async () => {
    mockApi(routes({ body: await signedExport() }));
    renderBench();
    expect(await screen.findByText('Checksum verified')).toBeTruthy();
    expect(screen.getByText('Hexloom bench export, schema version 1')).toBeTruthy();
  });

  it('says the checksum does not match when a field was edited after hashing', async () => {
    const exported = await signedExport();
    mockApi(routes({ body: { ...exported, drives: exported.drives.map((d, i) => (i === 0 ? { ...d, voltageV: 3.3 } : d)) } }));
    renderBench();
    expect(await screen.findByText(/Checksum does not match the data/)).toBeTruthy();
    expect(screen.queryByText('Checksum verified')).toBeNull();
  });

  it('asks the Touchstone route for the two chosen ports and shows its refusal in words', async () => {
    mockApi({
      ...routes({ body: await signedExport() }),
      [`GET ${VERSION}/touchstone`]: { status: 400, body: { statusCode: 400, error: 'Bad Request', message: 'Port "E01" is not wired to the outside' } },
    });
    const { user } = renderBench();
    await user.click(await screen.findByRole('checkbox', { name: /I have read these cautions/ }));
    await user.click(screen.getByRole('button', { name: 'Download Touchstone (.s2p)' }));
    expect(await screen.findByText('Port "E01" is not wired to the outside')).toBeTruthy();
    const url = vi.mocked(fetch).mock.calls.map(([input]) => new URL(String(input), 'http://localhost')).find((u) => u.pathname.endsWith('/touchstone'));
    expect(url?.searchParams.getAll('ports')).toEqual(['v(0,0)n/g(0,0)ne', 'v(1,0)n/g(1,0)ne']);
    expect(Number(url?.searchParams.get('points'))).toBe(1001);
    expect(blobs).toHaveLength(0);
  });

  it('shows any other refusal in the server’s words', async () => {
    mockApi(routes({ status: 404, body: { statusCode: 404, error: 'Not Found', message: 'Version 2 of configuration "Interferer notch" not found' } }));
    renderBench();
    expect(await screen.findByText('Version 2 of configuration "Interferer notch" not found')).toBeTruthy();
  });

  it('gives every control an accessible name (axe; contrast is left to the browser)', async () => {
    mockApi(routes({ body: await signedExport() }));
    const { container } = renderBench();
    await screen.findByText('Checksum verified');
    const result = await axe.run(container, { rules: { 'color-contrast': { enabled: false } } });
    expect(result.violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`)).toEqual([]);
  });
});

// The Measured tab: a bad line is named and nothing is sent; a good file is previewed then posted; the comparison in words.
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Comparison, Measurement } from '@hexloom/contracts';
import { DEMO_CONFIGURATION_ID } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { mockApi, type MockRoutes } from '../../../test/mockApi.js';
import { benchVersion, PORT_IN, PORT_OUT } from '../../bench/test/benchFixtures.js';
import { renderPanel } from '../../bench/test/renderPanel.js';
import { MeasuredPanel } from './MeasuredPanel.js';

afterEach(() => vi.unstubAllGlobals());

const LIST = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/2/measurements`;
const MEASUREMENT_ID = '3e4f5a6b-7c8d-4e9f-8a0b-1c2d3e4f5a6b';
const stored: Measurement = { id: MEASUREMENT_ID, versionNumber: 2, fileName: 'sweep.csv', format: 'csv', sizeBytes: 90, from: PORT_IN, to: PORT_OUT, label: 'Bench sweep A', points: 3, uploadedBy: 'noor', uploadedAt: '2026-12-01T10:00:00.000Z' };

const renderMeasured = (canUpload = true) => renderPanel(<MeasuredPanel teamId={DEMO_TEAM_ID} configurationId={DEMO_CONFIGURATION_ID} version={benchVersion} canUpload={canUpload} />);
const fileInput = () => screen.getByLabelText('Measured spectrum file (CSV or Touchstone)');
const csv = (name: string, text: string) => new File([text], name, { type: 'text/csv' });

describe('MeasuredPanel', () => {
  it('names the bad line of a CSV and sends nothing', async () => {
    const calls = mockApi({ [`GET ${LIST}`]: { body: [] } });
    const { user } = renderMeasured();
    await screen.findByText(/No measurement is attached to version 2 yet/);
    await user.upload(fileInput(), csv('sweep.csv', 'frequency_hz,amplitude_db\n193.40e12,-3.1\n193.41e12,abc\n193.42e12,-3.4\n'));
    const issues = await screen.findByTestId('measured-issues');
    expect(within(issues).getByText('Line 3: column amplitude_db has "abc", not a number')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Save measurement' })).toBeNull();
    expect(calls.some((c) => c.key.startsWith('POST'))).toBe(false);
  });

  it('previews a good file with its units and ports, then posts it with the chosen ports and label', async () => {
    let sent: FormData | undefined;
    const routes: MockRoutes = {
      [`GET ${LIST}`]: { body: [] },
      [`POST ${LIST}`]: (init) => {
        sent = init?.body as FormData;
        return { status: 201, body: stored };
      },
    };
    const calls = mockApi(routes);
    const { user } = renderMeasured();
    await screen.findByText(/No measurement is attached/);
    await user.upload(fileInput(), csv('sweep.csv', '# invented bench sweep\nfrequency_ghz,amplitude_db\n193400,-3.1\n193410,-3.25\n193420,-3.4\n'));
    const preview = await screen.findByTestId('measured-preview');
    expect(within(preview).getByText(/spectrum CSV, 3 points/)).toBeTruthy();
    expect(within(preview).getByText('frequency_ghz, in GHz')).toBeTruthy();
    const rows = within(within(preview).getByRole('table')).getAllByRole('row');
    expect(rows).toHaveLength(4);
    // 193 410 GHz - 193.4 THz = 10 GHz from the carrier (unit conversion, common practice).
    expect(within(rows[2] as HTMLElement).getAllByRole('cell').map((c) => c.textContent)).toEqual(['2', '193.41', '10', '−3.25']);
    expect(calls.some((c) => c.key.startsWith('POST'))).toBe(false);

    expect((screen.getByLabelText('From port') as HTMLSelectElement).value).toBe('W01');
    expect((screen.getByLabelText('To port') as HTMLSelectElement).value).toBe('E01');
    await user.type(screen.getByLabelText(/^Label/), 'Bench sweep A');
    await user.click(screen.getByRole('button', { name: 'Save measurement' }));
    await waitFor(() => expect(sent).toBeDefined());
    expect(sent?.get('from')).toBe('W01');
    expect(sent?.get('to')).toBe('E01');
    expect(sent?.get('label')).toBe('Bench sweep A');
    expect((sent?.get('file') as File).name).toBe('sweep.csv');
    expect(await screen.findByText(/Saved sweep.csv: 3 points/)).toBeTruthy();
  });

  it('previews a Touchstone file with its port count and the S21 it reads', async () => {
    mockApi({ [`GET ${LIST}`]: { body: [] } });
    const { user, container } = renderMeasured();
    await screen.findByText(/No measurement is attached/);
    const s2p = ['# GHZ S DB R 50', '193400 -40 0 -3 10 -3 10 -40 0', '193410 -40 0 -3.5 12 -3.5 12 -40 0'].join('\n');
    await user.upload(fileInput(), new File([s2p], 'sweep.s2p', { type: 'text/plain' }));
    const preview = await screen.findByTestId('measured-preview');
    expect(within(preview).getByText(/Touchstone file with 2 ports, 2 points/)).toBeTruthy();
    expect(within(preview).getByText(/\|S21\| in dB/)).toBeTruthy();
    const result = await axe.run(container, { rules: { 'color-contrast': { enabled: false } } });
    expect(result.violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`)).toEqual([]);
  });

  it('takes a dropped file, and refuses to save it with the same port twice', async () => {
    const calls = mockApi({ [`GET ${LIST}`]: { body: [] } });
    const { user } = renderMeasured();
    await screen.findByText(/No measurement is attached/);
    fireEvent.drop(screen.getByTestId('measured-drop-zone'), { dataTransfer: { files: [csv('dropped.csv', 'frequency_hz,amplitude_db\n193.40e12,-3.1\n193.41e12,-3.2\n')] } });
    expect(await screen.findByText(/dropped.csv: spectrum CSV, 2 points/)).toBeTruthy();
    await user.selectOptions(await screen.findByLabelText('To port'), 'W01');
    expect(screen.getByText('Choose two different ports.')).toBeTruthy();
    expect((screen.getByRole('button', { name: 'Save measurement' }) as HTMLButtonElement).disabled).toBe(true);
    expect(calls.some((c) => c.key.startsWith('POST'))).toBe(false);
  });

  it('shows the server’s refusal of an upload in words', async () => {
    mockApi({
      [`GET ${LIST}`]: { body: [] },
      [`POST ${LIST}`]: { status: 413, body: { statusCode: 413, error: 'Payload Too Large', message: 'The file is larger than 2097152 bytes' } },
    });
    const { user } = renderMeasured();
    await screen.findByText(/No measurement is attached/);
    await user.upload(fileInput(), csv('sweep.csv', 'frequency_hz,amplitude_db\n193.40e12,-3.1\n193.41e12,-3.2\n'));
    await user.click(await screen.findByRole('button', { name: 'Save measurement' }));
    expect(await screen.findByText('The file is larger than 2097152 bytes')).toBeTruthy();
  });

  it('shows a viewer the list without any upload control', async () => {
    mockApi({ [`GET ${LIST}`]: { body: [stored] } });
    renderMeasured(false);
    expect(await screen.findByRole('cell', { name: 'W01 → E01' })).toBeTruthy();
    expect(screen.queryByTestId('measured-drop-zone')).toBeNull();
    expect(screen.queryByText('Add a measurement')).toBeNull();
  });

  it('shows the comparison with the residual figures in words and units', async () => {
    const comparison: Comparison = {
      measurementId: MEASUREMENT_ID,
      offsetHz: [0, 10e9, 20e9],
      simulatedDb: [-3, -3.5, -4],
      measuredDb: [-3.1, -3.25, -4.6],
      residualDb: [-0.1, 0.25, -0.6],
      figures: { points: 3, rmsResidualDb: 0.377, meanResidualDb: -0.15, maxAbsResidualDb: 0.6, worstOffsetHz: 20e9 },
    };
    mockApi({ [`GET ${LIST}`]: { body: [stored] }, [`GET ${LIST}/${MEASUREMENT_ID}/comparison`]: { body: comparison } });
    const { user } = renderMeasured(false);
    await user.click(await screen.findByRole('button', { name: 'Compare Bench sweep A with the simulation' }));
    const figures = await screen.findByLabelText('Residual figures');
    const pairs = within(figures).getAllByRole('definition').map((dd) => `${dd.previousSibling?.textContent}: ${dd.textContent}`);
    expect(pairs).toEqual([
      'RMS residual: 0.377 dB',
      'Mean residual (measured above simulated when positive): −0.15 dB',
      'Largest residual: 0.6 dB at +20 GHz from the carrier',
      'Points compared: 3',
    ]);
    expect(screen.getByRole('img', { name: 'Measured and simulated transmitted power of W01 → E01' })).toBeTruthy();
    expect(screen.getByTestId('trace-measured').getAttribute('d')).toMatch(/^M.+L.+L/);
  });
});

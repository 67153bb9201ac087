// VersionsPanel: history newest first opened by keyboard, and the diff of two versions (circuits, changed gates
// marked on the mesh, figures side by side, both responses overlaid), with the server's errors in words.
import type { ConfigurationDetail, ConfigurationVersion, VersionDiff } from '@hexloom/contracts';
import { fireEvent, screen, within } from '@testing-library/react';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ringNotchContent } from '../../response/testing/ringNotchContent.js';
import { setCouplerKappa } from '../../response/utils/setCouplerKappa.js';
import { DEMO_CONFIGURATION_ID, demoDetail, demoVersion } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { mockApi } from '../../../test/mockApi.js';
import { renderWithProviders } from '../test/renderWithProviders.js';
import { VersionsPanel } from './VersionsPanel.js';

afterEach(() => vi.unstubAllGlobals());

const base = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`;
const content1 = ringNotchContent();
const coupler = content1.circuits[0]!.couplers[0]!.gate;
const content2 = setCouplerKappa(content1, 'notch', coupler, 0.3);
const changedGates = [coupler, content1.gates[0]!.gate];

const detail: ConfigurationDetail = {
  ...demoDetail,
  headVersion: 3,
  versions: [
    ...demoDetail.versions,
    { ...demoDetail.versions[1]!, id: '1e5f6a7b-8c9d-4e0f-8a1b-3c4d5e6f7a8b', number: 3, status: 'approved', author: 'noor', note: 'coupler at 30 %', approvedBy: 'ilse', approvedAt: '2026-12-01T15:45:00.000Z' },
  ],
};
const version = (number: number, content: typeof content1, notchDepthDb: number): ConfigurationVersion => ({
  ...demoVersion,
  number,
  content,
  figures: { notch: { notchDepthDb, insertionLossDb: 7.51 } },
});
const diff: VersionDiff = {
  from: 2,
  to: 3,
  gatesChanged: [
    { gate: coupler, before: { gate: coupler, state: 'split', kappa: 0.1, circuit: 'notch' }, after: { gate: coupler, state: 'split', kappa: 0.3, circuit: 'notch' } },
    { gate: changedGates[1]!, before: { gate: changedGates[1]!, state: 'cross', circuit: 'notch' }, after: null },
  ],
  circuitsAdded: ['bus'],
  circuitsRemoved: ['old-tap'],
  circuitsChanged: ['notch'],
  parkedStateChanged: false,
  figureChanges: [{ circuitId: 'notch', figure: 'notchDepthDb', before: 19.5, after: 24 }],
};
const routes = {
  [`GET ${base}/versions/2`]: { body: version(2, content1, 19.5) },
  [`GET ${base}/versions/3`]: { body: version(3, content2, 24) },
  [`GET ${base}/diff`]: { body: diff },
};

describe('VersionsPanel', () => {
  it('lists the versions newest first with status, author, approver and note, and opens one with Enter', async () => {
    mockApi(routes);
    const onOpen = vi.fn();
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={onOpen} />);
    const rows = within(screen.getByTestId('version-history')).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.getAttribute('data-testid'))).toEqual(['history-version-3', 'history-version-2', 'history-version-1']);
    expect(rows[0]!.textContent).toContain('approved');
    expect(rows[0]!.textContent).toContain('by ilse on');
    expect(rows[0]!.textContent).toContain('coupler at 30 %');
    expect(rows[0]!.textContent).toMatch(/\d{2}:\d{2}/);
    fireEvent.keyDown(screen.getByTestId('history-version-1'), { key: 'Enter' });
    expect(onOpen).toHaveBeenCalledWith(1);
    await screen.findByTestId('version-diff', {}, { timeout: 10_000 });
  });

  it('diffs the version before the shown one with it: added and removed circuits, the changed-gate count, marked gates', async () => {
    const calls = mockApi(routes);
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={() => undefined} />);
    const summary = await screen.findByTestId('diff-summary', {}, { timeout: 10_000 });
    expect(calls.some((c) => c.key === `GET ${base}/diff`)).toBe(true);
    const urls = vi.mocked(fetch).mock.calls.map(([input]) => String(input));
    expect(urls).toContain(`${base}/diff?from=2&to=3`);
    expect(within(summary).getByTestId('diff-gate-count').textContent).toContain('2 gates changed');
    expect(within(summary).getByTestId('circuits-added').textContent).toContain('bus');
    expect(within(summary).getByTestId('circuits-removed').textContent).toContain('old-tap');
    expect(within(summary).getByTestId('circuits-changed').textContent).toContain('notch');
    const marked = [...document.querySelectorAll('[data-marked="true"]')].map((g) => g.getAttribute('data-gate-id'));
    expect(marked.sort()).toEqual([...changedGates].sort());
    expect(screen.getByTestId('mesh-legend').textContent).toContain('Changed since v2 (2)');
    const gates = screen.getByTestId('changed-gates').textContent ?? '';
    expect(gates).toContain('split, 10 % cross-coupling, circuit notch');
    expect(gates).toContain('split, 30 % cross-coupling, circuit notch');
    expect(gates).toContain('parked (bar)');
    expect(screen.getByRole('link', { name: 'v2' }).getAttribute('href')).toBe(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}?v=2`);
    const result = await axe.run(screen.getByTestId('version-diff'), { rules: { 'color-contrast': { enabled: false } } });
    expect(result.violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`)).toEqual([]);
  });

  it('shows each figure of A and B side by side in words with the change, never a raw field name', async () => {
    mockApi(routes);
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={() => undefined} />);
    const table = await screen.findByTestId('figures-notch', {}, { timeout: 10_000 });
    const depth = within(table).getByRole('rowheader', { name: /Notch depth/ }).closest('tr')!;
    expect([...depth.querySelectorAll('td')].map((td) => td.textContent)).toEqual(['19.5 dB', '24 dB', '+4.5 dB']);
    const loss = within(table).getByRole('rowheader', { name: /Insertion loss/ }).closest('tr')!;
    expect(loss.textContent).toContain('no change');
    expect(table.textContent).not.toMatch(/notchDepthDb|insertionLossDb|e\+/);
  });

  it('overlays the responses of both versions between the same ports, labelled by version', async () => {
    mockApi(routes);
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={() => undefined} />);
    const legend = await screen.findByTestId('plot-legend', {}, { timeout: 20_000 });
    expect(within(legend).getByText('v2 in → out')).toBeTruthy();
    expect(within(legend).getByText('v3 in → out')).toBeTruthy();
    expect(screen.getByTestId('trace-0').getAttribute('d')).toMatch(/^M/);
    // Different coupling must give a different trace; identical paths would mean one version was plotted twice.
    expect(screen.getByTestId('trace-0').getAttribute('d')).not.toBe(screen.getByTestId('trace-1').getAttribute('d'));
  });

  it('asks for the versions picked in A and B', async () => {
    const calls = mockApi({ ...routes, [`GET ${base}/versions/1`]: { body: version(1, content1, 12) } });
    const urls = () => vi.mocked(fetch).mock.calls.map(([input]) => String(input));
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={() => undefined} />);
    await screen.findByTestId('diff-summary', {}, { timeout: 10_000 });
    fireEvent.change(screen.getByLabelText('Compare version A'), { target: { value: '1' } });
    await screen.findByText('Figures, v1 (A) and v3 (B)', {}, { timeout: 10_000 });
    expect(calls.filter((c) => c.key === `GET ${base}/diff`)).toHaveLength(2);
    expect(urls()).toContain(`${base}/diff?from=1&to=3`);
    expect(within(screen.getByTestId('version-history')).getByTestId('history-version-1').textContent).toContain('(A)');
  });

  it("shows the server's message in words when the diff is refused, and offers to try again", async () => {
    mockApi({ ...routes, [`GET ${base}/diff`]: { status: 404, body: { statusCode: 404, error: 'Not Found', message: 'Version 3 of this configuration does not exist.' } } });
    renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={detail} current={3} onOpen={() => undefined} />);
    const error = await screen.findByTestId('api-error', {}, { timeout: 10_000 });
    expect(error.textContent).toContain('Could not compare v2 with v3');
    expect(error.textContent).toContain('Version 3 of this configuration does not exist.');
    expect(within(error).getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('explains that one version cannot be compared, and has no accessibility violations', async () => {
    mockApi(routes);
    const { container } = renderWithProviders(<VersionsPanel teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" detail={{ ...detail, versions: [detail.versions[0]!] }} current={1} onOpen={() => undefined} />);
    expect(screen.getByText(/one version so far/)).toBeTruthy();
    const result = await axe.run(container, { rules: { 'color-contrast': { enabled: false } } });
    expect(result.violations.map((v) => v.id)).toEqual([]);
  });
});

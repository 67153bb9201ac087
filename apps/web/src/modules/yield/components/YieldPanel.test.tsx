// The yield panel: start from the prefilled form, follow the event stream to 100 %, cancel, errors and states in words.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '../../../test/mockApi.js';
import { rememberYieldJob } from '../utils/pastYieldJobs.js';
import { YIELD_GRID } from '../utils/yieldFormDefaults.js';
import { JOB_ID, JOBS, renderYieldPanel, YIELD_VERSION_ID, yieldJob, yieldVersion } from '../test/renderYieldPanel.js';

const IN = 'v(-1,-1)n/g(-1,-1)nw';
const OUT = 'v(-1,2)s/g(-2,3)ne';

afterEach(() => vi.unstubAllGlobals());

const remember = (runs = 200) =>
  rememberYieldJob(YIELD_VERSION_ID, { jobId: JOB_ID, request: { from: IN, to: OUT, grid: YIELD_GRID, mask: { regions: [] }, runs, seed: 1, couplerSigmaRad: 0.02, phaseSigmaRad: 0.05 } });

describe('YieldPanel', () => {
  it('posts runs, seed and the chip technology spreads from the prefilled form, ports by id', async () => {
    const calls = mockApi({ [`POST ${JOBS}`]: { status: 202, body: yieldJob() }, [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob() } });
    const { user } = renderYieldPanel('reviewer', yieldVersion({ couplerSigmaRad: 0.03, phaseSigmaRad: 0.07 }));
    expect((screen.getByLabelText('From port') as HTMLSelectElement).selectedOptions[0]?.textContent).toBe('in');
    expect((screen.getByLabelText('To port') as HTMLSelectElement).selectedOptions[0]?.textContent).toBe('out');
    await user.click(screen.getByRole('button', { name: 'Start the yield study' }));
    await waitFor(() => expect(calls.some((c) => c.key === `POST ${JOBS}`)).toBe(true));
    expect(calls.find((c) => c.key === `POST ${JOBS}`)?.body).toEqual({ from: IN, to: OUT, grid: YIELD_GRID, mask: { regions: [] }, runs: 200, seed: 1, couplerSigmaRad: 0.03, phaseSigmaRad: 0.07 });
  });

  it('states the default spreads when the chip has none and sends what the user typed', async () => {
    const calls = mockApi({ [`POST ${JOBS}`]: { status: 202, body: yieldJob() }, [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob() } });
    const { user } = renderYieldPanel('designer');
    expect(screen.getByTestId('yield-form').textContent).toContain('prefilled with 0.02 rad for couplers and 0.05 rad for phases');
    await user.clear(screen.getByLabelText('Runs'));
    await user.type(screen.getByLabelText('Runs'), '500');
    await user.clear(screen.getByLabelText('Seed'));
    await user.type(screen.getByLabelText('Seed'), '42');
    await user.click(screen.getByRole('button', { name: 'Start the yield study' }));
    await waitFor(() => expect(calls.find((c) => c.key === `POST ${JOBS}`)?.body).toMatchObject({ runs: 500, seed: 42, couplerSigmaRad: 0.02, phaseSigmaRad: 0.05 }));
  });

  it('moves the progress bar with each streamed event up to 100 % and then shows the yield in words', async () => {
    mockApi({ [`POST ${JOBS}`]: { status: 202, body: yieldJob() }, [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob() } });
    const { user, streams } = renderYieldPanel('owner');
    await user.click(screen.getByRole('button', { name: 'Start the yield study' }));
    const bar = await screen.findByRole('progressbar', { name: 'Yield study progress' });
    expect(bar.getAttribute('aria-valuenow')).toBe('0');
    await waitFor(() => expect(streams.opened).toHaveLength(1));
    const stream = streams.opened[0]!;
    expect(stream.url).toBe(`${JOBS}/${JOB_ID}/events`);
    act(() => stream.emit(yieldJob({ runsDone: 50 })));
    await waitFor(() => expect(screen.getByRole('progressbar', { name: 'Yield study progress' }).getAttribute('aria-valuenow')).toBe('25'));
    act(() => stream.emit(yieldJob({ runsDone: 200 })));
    await waitFor(() => expect(screen.getByRole('progressbar', { name: 'Yield study progress' }).getAttribute('aria-valuenow')).toBe('100'));
    expect(screen.getByTestId('yield-progress').textContent).toContain('200 of 200 runs (100 %)');
    const summary = { runs: 200, passed: 175, yield: 0.875, yieldStdError: 0.0234, figures: { worstMarginDb: { mean: 1, std: 0.5, min: -1, p05: -0.2, p50: 1, p95: 1.8, max: 2 } } };
    act(() => stream.emit(yieldJob({ status: 'done', runsDone: 200, summary })));
    expect((await screen.findByTestId('yield-result')).textContent).toContain('Yield 87.5 % of 200 runs');
    expect(stream.closed).toBe(true);
  });

  it('falls back to polling the job when the stream fails', async () => {
    remember();
    let reads = 0;
    mockApi({ [`GET ${JOBS}/${JOB_ID}`]: () => ({ body: yieldJob({ runsDone: ++reads === 1 ? 20 : 120 }) }) });
    const { streams } = renderYieldPanel('viewer');
    await waitFor(() => expect(streams.opened).toHaveLength(1));
    expect(screen.getByRole('progressbar', { name: 'Yield study progress' }).getAttribute('aria-valuenow')).toBe('10');
    act(() => streams.opened[0]!.fail());
    expect(streams.opened[0]!.closed).toBe(true);
    await waitFor(() => expect(screen.getByRole('progressbar', { name: 'Yield study progress' }).getAttribute('aria-valuenow')).toBe('60'), { timeout: 4_000 });
    expect(screen.getByTestId('yield-progress').textContent).toContain('checks every 2 seconds');
    expect(streams.opened).toHaveLength(1);
  });

  it('sends DELETE when a reviewer cancels and shows the study as cancelled', async () => {
    remember();
    const calls = mockApi({ [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob({ runsDone: 40 }) }, [`DELETE ${JOBS}/${JOB_ID}`]: { body: yieldJob({ status: 'cancelled', runsDone: 40 }) } });
    const { user } = renderYieldPanel('reviewer');
    await user.click(await screen.findByRole('button', { name: 'Cancel the study' }));
    await waitFor(() => expect(calls.filter((c) => c.key === `DELETE ${JOBS}/${JOB_ID}`)).toHaveLength(1));
    expect((await screen.findByText('Cancelled')).closest('[data-testid="yield-job"]')?.textContent).toContain('cancelled after 40 of 200 runs');
  });

  it('shows a viewer past studies without the form or Cancel', async () => {
    remember();
    mockApi({ [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob({ runsDone: 40 }) } });
    renderYieldPanel('viewer');
    await screen.findByRole('progressbar', { name: 'Yield study progress' });
    expect(screen.queryByTestId('yield-form')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Cancel the study' })).toBeNull();
  });

  it('says a job is interrupted and offers to start it again with the same settings', async () => {
    remember();
    const calls = mockApi({
      [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob({ status: 'interrupted', runsDone: 80, error: 'the server stopped while this job ran; start it again' }) },
      [`POST ${JOBS}`]: { status: 202, body: yieldJob() },
    });
    const { user } = renderYieldPanel('designer');
    const callout = await screen.findByTestId('yield-interrupted');
    expect(callout.textContent).toContain('Interrupted');
    expect(callout.textContent).toContain('80 of 200 runs done');
    await user.click(within(callout).getByRole('button', { name: 'Start it again' }));
    await waitFor(() => expect(calls.find((c) => c.key === `POST ${JOBS}`)?.body).toMatchObject({ from: IN, to: OUT, runs: 200, seed: 1 }));
  });

  it('replays a finished study in the browser: one bar per bin, counts summing to the runs, and the gate ranking', async () => {
    const mask = { regions: [{ kind: 'pass' as const, range: { fromHz: -2e9, toHz: 2e9 }, maxInsertionLossDb: 3 }] };
    rememberYieldJob(YIELD_VERSION_ID, { jobId: JOB_ID, request: { from: IN, to: OUT, grid: { kind: 'span', startOffsetHz: -5e9, stopOffsetHz: 5e9, points: 41 }, mask, runs: 12, seed: 7, couplerSigmaRad: 0.05, phaseSigmaRad: 0.1 } });
    const summary = { runs: 12, passed: 6, yield: 0.5, yieldStdError: 0.144, figures: {} };
    mockApi({ [`GET ${JOBS}/${JOB_ID}`]: { body: yieldJob({ status: 'done', runsDone: 12, runsTotal: 12, summary }) } });
    const { user } = renderYieldPanel('viewer');
    await user.click(await screen.findByRole('button', { name: /Show the histogram/ }));
    const bars = await screen.findAllByTestId('margin-bar', {}, { timeout: 10_000 });
    expect(bars.reduce((n, b) => n + Number(b.getAttribute('data-count')), 0)).toBe(12);
    expect(within(screen.getByTestId('gate-sensitivities')).getAllByRole('row').length).toBeGreaterThan(1);
  }, 20_000);

  it('shows a 429 from the server in words', async () => {
    mockApi({ [`POST ${JOBS}`]: { status: 429, body: { statusCode: 429, error: 'Too Many Requests', message: 'the team already has 2 yield jobs running (at most 2); wait for one to finish or cancel one' } } });
    renderYieldPanel('owner');
    fireEvent.submit(screen.getByTestId('yield-form'));
    const callout = await screen.findByTestId('api-error');
    expect(callout.textContent).toContain('Too many yield studies are running');
    expect(callout.textContent).toContain('the team already has 2 yield jobs running');
  });
});

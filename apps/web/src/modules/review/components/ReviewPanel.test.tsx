// ReviewPanel: review requests, a decision on the version shown, comment threads with replies, @mentions and resolve.
import { BlueprintProvider } from '@blueprintjs/core';
import type { Comment, Review, TeamRole } from '@hexloom/contracts';
import { QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import axe from 'axe-core';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../core/api/createQueryClient.js';
import { DEMO_CONFIGURATION_ID, demoDetail, demoVersion } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { mockApi, type MockRoutes } from '../../../test/mockApi.js';
import { ReviewPanel } from './ReviewPanel.js';

afterEach(() => vi.unstubAllGlobals());

// Invented teammates; demoVersion (v2) was written by tobin.
const MEMBERS = [
  { login: 'ilse', name: 'Ilse Marrow', role: 'owner' },
  { login: 'noor', name: 'Noor Halvorsen', role: 'designer' },
  { login: 'tobin', name: 'Tobin Achterberg', role: 'designer' },
  { login: 'caspar', name: 'Caspar Iyengar', role: 'reviewer' },
  { login: 'dario', name: 'Dario Fennimore', role: 'viewer' },
];
const V2 = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/2`;
const ROOT_ID = '11111111-1111-4111-8111-111111111111';
const REPLY_ID = '22222222-2222-4222-8222-222222222222';

const review = (reviewer: string, over: Partial<Review> = {}): Review => ({
  id: `33333333-3333-4333-8333-33333333333${reviewer.length}`,
  versionNumber: 2,
  reviewer,
  requestedBy: 'noor',
  requestedAt: '2026-12-01T09:00:00.000Z',
  decision: null,
  note: '',
  decidedAt: null,
  ...over,
});
const COMMENTS: Comment[] = [
  {
    id: ROOT_ID, versionNumber: 2, parentId: null, author: 'noor', body: '@caspar is the notch deep enough here?', anchor: { gate: 'g(1,0)e' },
    mentions: ['caspar'], createdAt: '2026-12-01T10:00:00.000Z', resolvedAt: null, resolvedBy: null,
  },
  {
    id: REPLY_ID, versionNumber: 2, parentId: ROOT_ID, author: 'caspar', body: 'It meets 19.5 dB; fine.', anchor: null,
    mentions: [], createdAt: '2026-12-01T11:00:00.000Z', resolvedAt: null, resolvedBy: null,
  },
];

function routes(over: MockRoutes = {}): MockRoutes {
  return {
    [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`]: { body: demoDetail },
    [`GET ${V2}/reviews`]: { body: [review('caspar')] },
    [`GET ${V2}/comments`]: { body: COMMENTS },
    [`POST ${V2}/reviews`]: { status: 201, body: [review('caspar'), review('ilse')] },
    [`POST ${V2}/decision`]: { body: [review('caspar', { decision: 'approve', decidedAt: '2026-12-03T17:04:00.000Z' })] },
    [`POST ${V2}/comments`]: { status: 201, body: COMMENTS[1] },
    [`PATCH ${V2}/comments/${ROOT_ID}`]: { body: { ...COMMENTS[0], resolvedAt: '2026-12-03T17:04:00.000Z', resolvedBy: 'caspar' } },
    ...over,
  };
}

function renderPanel(meLogin: string, role: TeamRole, extra: { onPinGate?: (gateId: string | undefined) => void; selectedGateId?: string } = {}) {
  return render(
    <QueryClientProvider client={createQueryClient({ retries: 0 })}>
      <BlueprintProvider>
        <ReviewPanel teamId={DEMO_TEAM_ID} configurationId={DEMO_CONFIGURATION_ID} version={demoVersion} members={MEMBERS} meLogin={meLogin} role={role} {...extra} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
}

const bodyOf = (calls: { key: string; body: unknown }[], key: string): unknown => calls.find((c) => c.key === key)?.body;

describe('ReviewPanel', () => {
  it('requests a review from the chosen teammates, offering neither the author nor a viewer', async () => {
    const calls = mockApi(routes());
    renderPanel('noor', 'designer');
    const reviewers = await screen.findByRole('group', { name: 'Reviewers for v2' });
    expect(within(reviewers).queryByLabelText(/tobin/)).toBeNull();
    expect(within(reviewers).queryByLabelText(/dario/)).toBeNull();
    fireEvent.click(within(reviewers).getByLabelText('Caspar Iyengar (caspar), reviewer'));
    fireEvent.click(within(reviewers).getByLabelText('Ilse Marrow (ilse), owner'));
    fireEvent.click(screen.getByRole('button', { name: 'Request review of v2' }));
    await waitFor(() => expect(bodyOf(calls, `POST ${V2}/reviews`)).toEqual({ reviewers: ['caspar', 'ilse'], message: '' }));
    expect(await screen.findByText(/Review requested from caspar, ilse/)).toBeTruthy();
  });

  it('shows no approve button to a named reviewer who wrote the version', async () => {
    mockApi(routes({ [`GET ${V2}/reviews`]: { body: [review('tobin')] } }));
    renderPanel('tobin', 'designer');
    expect(await screen.findByText('You wrote v2, so a teammate decides on it.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /Approve/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Request changes/ })).toBeNull();
  });

  it('posts a named reviewer\'s decision to the version shown and then shows the approval bound to it', async () => {
    let approved = false;
    const calls = mockApi(
      routes({
        [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`]: () => ({
          body: approved ? { ...demoDetail, versions: demoDetail.versions.map((v) => (v.number === 2 ? { ...v, status: 'approved', approvedBy: 'caspar', approvedAt: '2026-12-03T17:04:00.000Z' } : v)) } : demoDetail,
        }),
        [`POST ${V2}/decision`]: () => {
          approved = true;
          return { body: [review('caspar', { decision: 'approve', decidedAt: '2026-12-03T17:04:00.000Z' })] };
        },
      }),
    );
    renderPanel('caspar', 'reviewer');
    fireEvent.change(await screen.findByLabelText('Note for the author about v2 (optional)'), { target: { value: 'Good for the bench.' } });
    fireEvent.click(screen.getByRole('button', { name: 'Approve v2' }));
    await waitFor(() => expect(bodyOf(calls, `POST ${V2}/decision`)).toEqual({ decision: 'approve', note: 'Good for the bench.' }));
    expect(calls.some((c) => c.key.startsWith('POST') && c.key.includes('/versions/1/'))).toBe(false);
    await waitFor(() => expect(screen.getByTestId('approval-line').textContent).toMatch(/Approved v2 by Caspar Iyengar, 03 Dec 2026/));
  });

  it('warns when a newer version is not approved', async () => {
    const v3 = { ...demoDetail.versions[1]!, id: '44444444-4444-4444-8444-444444444444', number: 3, status: 'draft' as const };
    mockApi(routes({ [`GET /api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}`]: { body: { ...demoDetail, headVersion: 3, versions: [...demoDetail.versions, v3] } } }));
    renderPanel('caspar', 'reviewer');
    const callout = await screen.findByTestId('newer-version-callout');
    expect(callout.textContent).toMatch(/Version 3 was saved after v2 and is a draft, not approved/);
  });

  it('highlights mentions, pins a gate anchor, and sends a reply with its parentId', async () => {
    const onPinGate = vi.fn();
    const calls = mockApi(routes());
    renderPanel('caspar', 'reviewer', { onPinGate });
    const thread = await screen.findByTestId(`thread-${ROOT_ID}`);
    expect(within(thread).getByText('@caspar').tagName).toBe('MARK');
    fireEvent.click(within(thread).getByRole('button', { name: 'Show gate g(1,0)e on the mesh' }));
    expect(onPinGate).toHaveBeenCalledWith('g(1,0)e');
    fireEvent.click(within(thread).getByRole('button', { name: 'Reply to Noor Halvorsen' }));
    fireEvent.change(within(thread).getByLabelText('Your reply'), { target: { value: 'Agreed.' } });
    fireEvent.click(within(thread).getByRole('button', { name: 'Reply' }));
    await waitFor(() => expect(bodyOf(calls, `POST ${V2}/comments`)).toEqual({ body: 'Agreed.', parentId: ROOT_ID }));
  });

  it('suggests caspar for "@ca" and completes the mention with the keyboard', async () => {
    const user = userEvent.setup();
    mockApi(routes());
    renderPanel('noor', 'designer');
    const box = await screen.findByLabelText('New comment');
    await user.type(box, 'see @ca');
    const list = screen.getByRole('listbox', { name: 'Teammates to mention' });
    expect(within(list).getAllByRole('option').map((o) => o.textContent)).toEqual(['@caspar Caspar Iyengar']);
    await user.keyboard('{Enter}');
    expect((box as HTMLTextAreaElement).value).toBe('see @caspar ');
    expect(screen.queryByRole('listbox')).toBeNull();
  });

  it('posts a new comment on the selected gate or on a typed band, and refuses a reversed band in words', async () => {
    const calls = mockApi(routes());
    renderPanel('noor', 'designer', { selectedGateId: 'g(0,0)ne' });
    fireEvent.change(await screen.findByLabelText('New comment'), { target: { value: 'Check this gate' } });
    fireEvent.click(screen.getByLabelText('The selected gate, g(0,0)ne'));
    fireEvent.click(screen.getByRole('button', { name: 'Comment' }));
    await waitFor(() => expect(bodyOf(calls, `POST ${V2}/comments`)).toEqual({ body: 'Check this gate', anchor: { gate: 'g(0,0)ne' } }));
    await waitFor(() => expect((screen.getByLabelText('New comment') as HTMLTextAreaElement).value).toBe(''));
    fireEvent.change(screen.getByLabelText('New comment'), { target: { value: 'Ripple here' } });
    fireEvent.click(screen.getByLabelText('A frequency band'));
    fireEvent.change(screen.getByLabelText('Band from, GHz from the reference'), { target: { value: '2' } });
    fireEvent.change(screen.getByLabelText('Band to, GHz from the reference'), { target: { value: '1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Comment' }));
    expect(await screen.findByText('The band must end at or above where it starts')).toBeTruthy();
    expect(calls.filter((c) => c.key === `POST ${V2}/comments`)).toHaveLength(1);
  });

  it('resolves a thread with a PATCH to its first comment', async () => {
    const calls = mockApi(routes());
    renderPanel('caspar', 'reviewer');
    fireEvent.click(await screen.findByRole('button', { name: 'Resolve the thread of Noor Halvorsen' }));
    await waitFor(() => expect(bodyOf(calls, `PATCH ${V2}/comments/${ROOT_ID}`)).toEqual({ resolved: true }));
  });

  it('lets a viewer read the threads but shows no write control', async () => {
    mockApi(routes());
    renderPanel('dario', 'viewer');
    expect(await screen.findByText('It meets 19.5 dB; fine.')).toBeTruthy();
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
    for (const name of [/Reply/, /Resolve/, /Request review/, /Approve/, /Request changes/, /^Comment$/]) expect(screen.queryByRole('button', { name })).toBeNull();
  });

  it('shows a 422 and a 409 from the server in words', async () => {
    mockApi(
      routes({
        [`GET ${V2}/reviews`]: { body: [review('caspar')] },
        [`POST ${V2}/reviews`]: { status: 422, body: { statusCode: 422, error: 'Unprocessable Entity', message: '"caspar" cannot review this version: viewers cannot review' } },
        [`PATCH ${V2}/comments/${ROOT_ID}`]: { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'The thread changed meanwhile; reload the comments' } },
      }),
    );
    renderPanel('ilse', 'owner');
    fireEvent.click(await screen.findByLabelText('Caspar Iyengar (caspar), reviewer'));
    fireEvent.click(screen.getByRole('button', { name: 'Request review of v2' }));
    expect(await screen.findByText('"caspar" cannot review this version: viewers cannot review')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Resolve the thread of Noor Halvorsen' }));
    expect(await screen.findByText('The thread changed meanwhile; reload the comments')).toBeTruthy();
    expect(screen.getByText('Could not resolve the thread')).toBeTruthy();
  });

  it('gives every control an accessible name (axe; contrast is left to the browser)', async () => {
    mockApi(routes());
    renderPanel('noor', 'designer', { selectedGateId: 'g(0,0)ne' });
    const panel = await screen.findByTestId('review-panel');
    await screen.findByTestId(`thread-${ROOT_ID}`);
    fireEvent.click(screen.getByLabelText('A frequency band'));
    const result = await axe.run(panel, { rules: { 'color-contrast': { enabled: false } } });
    expect(result.violations.map((v) => `${v.id}: ${v.nodes[0]?.html ?? ''}`)).toEqual([]);
  }, 60_000);
});

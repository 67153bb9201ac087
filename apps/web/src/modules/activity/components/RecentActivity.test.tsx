// RecentActivity: the audit log in words for owners (names, versions, dates with time), "Show more", and a note for others.
import type { AuditEvent } from '@hexloom/contracts';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_TEAM_ID, demoMe, demoMembers } from '../../../test/demoTeam.js';
import { mockApi } from '../../../test/mockApi.js';
import { renderWithProviders } from '../../versions/test/renderWithProviders.js';
import { ACTIVITY_PAGE, RecentActivity } from './RecentActivity.js';

afterEach(() => vi.unstubAllGlobals());

const AUDIT = `GET /api/teams/${DEMO_TEAM_ID}/audit`;
const MEMBERS = { [`GET /api/teams/${DEMO_TEAM_ID}/members`]: { body: demoMembers } };
const id = (i: number) => `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`;
const events: AuditEvent[] = [
  { id: id(1), at: '2026-12-02T14:20:00.000Z', actor: 'noor', action: 'version.saved', target: 'Interferer notch', detail: { configurationId: id(90), version: 3 } },
  { id: id(2), at: '2026-12-02T11:00:00.000Z', actor: 'ilse', action: 'review.decided', target: 'Interferer notch v2', detail: { configurationId: id(90), version: 2, decision: 'request_changes' } },
  { id: id(3), at: '2026-12-01T09:10:00.000Z', actor: 'noor', action: 'review.requested', target: 'Interferer notch v2', detail: { configurationId: id(90), version: 2, reviewers: ['ilse', 'caspar'] } },
  { id: id(4), at: '2026-11-30T16:00:00.000Z', actor: 'ilse', action: 'member.role_changed', target: 'dario', detail: { userId: id(91), from: 'designer', to: 'viewer' } },
  { id: id(5), at: '2026-11-30T15:00:00.000Z', actor: 'noor', action: 'chip.updated', target: 'Demo mesh', detail: { chipId: id(92), revision: 2, fields: ['deadGates'] } },
  { id: id(6), at: '2026-11-30T14:00:00.000Z', actor: null, action: 'some.future_action', target: 'Demo mesh', detail: {} },
];
const limitOf = (call: unknown[]) => new URL(String(call[0]), 'http://localhost').searchParams.get('limit');

describe('RecentActivity', () => {
  it('writes each event as a sentence with names, newest first, with date and time, and no raw event code', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, ...MEMBERS, [AUDIT]: { body: events } });
    renderWithProviders(<RecentActivity teamId={DEMO_TEAM_ID} />);
    await waitFor(() => expect(screen.getAllByTestId('activity-entry')[0]?.textContent).toContain('Noor Halvorsen'));
    const lines = screen.getAllByTestId('activity-entry').map((li) => li.querySelector('span')?.textContent);
    expect(lines).toEqual([
      'Noor Halvorsen saved v3 of Interferer notch',
      'Ilse Marrow requested changes to Interferer notch v2',
      'Noor Halvorsen asked Ilse Marrow and caspar to review Interferer notch v2',
      'Ilse Marrow changed the role of Dario Fennimore from designer to viewer',
      'Noor Halvorsen changed the dead gates of the chip Demo mesh',
      'A former member made a change to Demo mesh',
    ]);
    const text = screen.getByTestId('recent-activity').textContent ?? '';
    expect(text).not.toMatch(/version\.saved|review\.|member\.role|chip\.updated|some\.future|deadGates/);
    expect(screen.getAllByTestId('activity-entry')[0]?.querySelector('time')?.textContent).toMatch(/^\d{2} \w{3} 2026, \d{2}:\d{2}/);
    expect(screen.queryByRole('button', { name: 'Show more' })).toBeNull();
  });

  it('asks for the next page with a larger limit on "Show more"', async () => {
    const page = Array.from({ length: ACTIVITY_PAGE }, (_, i): AuditEvent => ({ id: id(100 + i), at: '2026-12-02T10:00:00.000Z', actor: 'noor', action: 'comment.created', target: `Notch v${i + 1}`, detail: {} }));
    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, ...MEMBERS, [AUDIT]: { body: page } });
    renderWithProviders(<RecentActivity teamId={DEMO_TEAM_ID} />);
    fireEvent.click(await screen.findByRole('button', { name: 'Show more' }));
    await waitFor(() => expect(vi.mocked(fetch).mock.calls.map(limitOf)).toContain(String(2 * ACTIVITY_PAGE)));
    expect(vi.mocked(fetch).mock.calls.map(limitOf)).toContain(String(ACTIVITY_PAGE));
    // The server answered fewer than asked for: that was the last page.
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Show more' })).toBeNull());
  });

  it('tells a non-owner the log is for owners, without asking the server for it', async () => {
    const calls = mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, ...MEMBERS, [AUDIT]: { body: events } });
    renderWithProviders(<RecentActivity teamId={DEMO_TEAM_ID} />);
    expect(await screen.findByText("Only the team's owners can read its activity log.")).toBeTruthy();
    expect(calls.some((c) => c.key === AUDIT)).toBe(false);
    expect(screen.queryByTestId('activity-entry')).toBeNull();
  });

  it("shows the server's message in words when it refuses the log", async () => {
    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, ...MEMBERS, [AUDIT]: { status: 400, body: { statusCode: 400, error: 'Bad Request', message: 'Invalid query', issues: [{ path: 'limit', message: 'Too big: expected number to be <=500' }] } } });
    renderWithProviders(<RecentActivity teamId={DEMO_TEAM_ID} />);
    const error = await screen.findByTestId('api-error');
    expect(error.textContent).toContain('Could not load the recent activity');
    expect(error.textContent).toContain('Too big: expected number to be <=500');
  });
});

// WaitingForMyReview: the versions waiting for the signed-in member's review, each a link to that exact version.
import type { WaitingReview } from '@hexloom/contracts';
import { screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CHIP_ID, DEMO_CONFIGURATION_ID } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { mockApi } from '../../../test/mockApi.js';
import { renderWithProviders } from '../test/renderWithProviders.js';
import { WaitingForMyReview } from './WaitingForMyReview.js';

afterEach(() => vi.unstubAllGlobals());

const WAITING = `GET /api/teams/${DEMO_TEAM_ID}/reviews/waiting`;
const waiting: WaitingReview[] = [
  { reviewId: '2a6b7c8d-9e0f-4a1b-8c2d-3e4f5a6b7c8d', configurationId: DEMO_CONFIGURATION_ID, configurationName: 'Interferer notch', chipId: DEMO_CHIP_ID, chipName: 'Demo mesh (invented)', versionNumber: 2, versionStatus: 'in_review', author: 'tobin', requestedBy: 'noor', requestedAt: '2026-11-30T10:05:00.000Z' },
  { reviewId: '3b7c8d9e-0f1a-4b2c-9d3e-4f5a6b7c8d9e', configurationId: '4c8d9e0f-1a2b-4c3d-8e4f-5a6b7c8d9e0f', configurationName: 'Band-pass pair', chipId: DEMO_CHIP_ID, chipName: 'Demo mesh (invented)', versionNumber: 5, versionStatus: 'in_review', author: 'noor', requestedBy: 'noor', requestedAt: '2026-12-01T08:30:00.000Z' },
];

describe('WaitingForMyReview', () => {
  it('links each waiting version to the configuration at that version (?v=N), with who asked and when', async () => {
    mockApi({ [WAITING]: { body: waiting } });
    renderWithProviders(<WaitingForMyReview teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" />);
    const first = await screen.findByRole('link', { name: 'Interferer notch v2' });
    expect(first.getAttribute('href')).toBe(`/t/kestrel-vale/configurations/${DEMO_CONFIGURATION_ID}?v=2`);
    expect(screen.getByRole('link', { name: 'Band-pass pair v5' }).getAttribute('href')).toBe('/t/kestrel-vale/configurations/4c8d9e0f-1a2b-4c3d-8e4f-5a6b7c8d9e0f?v=5');
    const section = screen.getByTestId('waiting-for-my-review');
    expect(within(section).getByRole('heading').textContent).toBe('Waiting for your review (2)');
    expect(section.textContent).toContain('saved by tobin. noor asked you on');
    expect(section.textContent).toContain('in review');
  });

  it('says so when nothing waits', async () => {
    mockApi({ [WAITING]: { body: [] } });
    renderWithProviders(<WaitingForMyReview teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" />);
    expect(await screen.findByText('Nothing waits for your review.')).toBeTruthy();
    expect(screen.queryByRole('link')).toBeNull();
  });

  it("shows the server's refusal in words (403 for a non-member) with Try again", async () => {
    mockApi({ [WAITING]: { status: 403, body: { statusCode: 403, error: 'Forbidden', message: 'You are not a member of this team.' } } });
    renderWithProviders(<WaitingForMyReview teamId={DEMO_TEAM_ID} teamSlug="kestrel-vale" />);
    const error = await screen.findByTestId('api-error');
    expect(error.textContent).toContain('Could not load the reviews waiting for you');
    expect(error.textContent).toContain('You are not a member of this team.');
    expect(within(error).getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});

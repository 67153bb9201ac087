// The outbox page: an owner reads the mail newest first and opens one; a non-owner gets the 403 in words.
import { screen, within } from '@testing-library/react';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AppProviders } from '../AppProviders.js';
import { createQueryClient } from '../modules/core/api/createQueryClient.js';
import { DEMO_TEAM_ID, demoMe } from '../test/demoTeam.js';
import { mockApi } from '../test/mockApi.js';
import { OutboxPage } from './OutboxPage.js';

const OUTBOX = `GET /api/teams/${DEMO_TEAM_ID}/outbox`;
const older = { id: '3a7b8c9d-0e1f-4a2b-8c3d-5e6f7a8b9c0d', kind: 'invitation', to: 'wen@kestrel-vale.example', subject: 'You are invited to Kestrel Vale RF Photonics', text: 'Ilse invited you.\nAccept: https://hexloom.example/invitations/abc.\nThanks', createdAt: '2026-12-01T08:00:00.000Z' };
const newer = { id: '4b8c9d0e-1f2a-4b3c-9d4e-6f7a8b9c0d1e', kind: 'review_requested', to: 'ilse@kestrel-vale.example', subject: 'Review requested: Interferer notch v2', text: 'Noor asks you to review v2.', createdAt: '2026-12-02T15:45:00.000Z' };

/** Mounts the page alone at /t/kestrel-vale/outbox (the lead wires the route into the app). */
function renderOutbox() {
  const router = createMemoryRouter([{ path: '/t/:teamSlug/outbox', element: <OutboxPage /> }], { initialEntries: ['/t/kestrel-vale/outbox'] });
  return render(<AppProviders queryClient={createQueryClient({ retries: 0 })} router={router} />);
}

afterEach(() => vi.unstubAllGlobals());

describe('OutboxPage', () => {
  it('lists the messages newest first and opens one with subject, recipient, date and clickable links', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, [OUTBOX]: { body: [older, newer] } });
    renderOutbox();
    const items = await screen.findAllByTestId('outbox-item');
    expect(items.map((i) => i.textContent)).toEqual([expect.stringContaining(newer.subject), expect.stringContaining(older.subject)]);
    await userEvent.setup().click(items[1]!);
    const message = screen.getByTestId('outbox-message');
    expect(within(message).getByRole('heading', { name: older.subject })).toBeTruthy();
    expect(message.textContent).toContain('wen@kestrel-vale.example');
    expect(message.querySelector('time')?.getAttribute('dateTime')).toBe(older.createdAt);
    expect(message.querySelector('time')?.textContent).toMatch(/01 Dec 2026, \d\d:\d\d/);
    const link = within(message).getByRole('link', { name: 'https://hexloom.example/invitations/abc' });
    expect(link.getAttribute('href')).toBe('https://hexloom.example/invitations/abc');
    expect(screen.getByTestId('outbox-body').textContent).toBe(older.text);
  });

  it('says so when the outbox is empty', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, [OUTBOX]: { body: [] } });
    renderOutbox();
    expect(await screen.findByText('The outbox is empty')).toBeTruthy();
  });

  it('shows a non-owner the 403 in words', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, [OUTBOX]: { status: 403, body: { statusCode: 403, error: 'Forbidden', message: 'This needs one of the roles owner in the team; you are designer' } } });
    renderOutbox();
    const callout = await screen.findByTestId('outbox-forbidden');
    expect(callout.textContent).toContain('Only owners of this team can read its outbox');
    expect(callout.textContent).toContain('you are designer');
  });
});

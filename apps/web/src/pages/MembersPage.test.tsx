// The members page: table from the API, owner-only controls, and server errors shown with their fields.
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_TEAM_ID, demoMe, demoMembers } from '../test/demoTeam.js';
import { mockApi } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

const MEMBERS = `GET /api/teams/${DEMO_TEAM_ID}/members`;
const INVITATIONS = `GET /api/teams/${DEMO_TEAM_ID}/invitations`;

afterEach(() => vi.unstubAllGlobals());

describe('MembersPage', () => {
  it('renders every member of the team in the table with name, login, e-mail and role', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, [MEMBERS]: { body: demoMembers } });
    renderApp('/t/kestrel-vale/members');
    const table = await screen.findByTestId('members-table');
    await within(table).findByText('Ilse Marrow');
    for (const member of demoMembers) {
      expect(within(table).getByText(member.name)).toBeTruthy();
      expect(within(table).getByText(member.login)).toBeTruthy();
    }
    expect(within(table).getByText('noor@kestrel-vale.example')).toBeTruthy();
    expect(within(table).getAllByText('designer').length).toBe(1);
    expect(within(table).getAllByText('viewer').length).toBe(1);
  });

  it('shows a role select per member to an owner and none to a designer', async () => {
    mockApi({ 'GET /api/me': { body: demoMe('noor', 'designer') }, [MEMBERS]: { body: demoMembers } });
    const designerView = renderApp('/t/kestrel-vale/members');
    await within(await screen.findByTestId('members-table')).findByText('Ilse Marrow');
    expect(screen.queryAllByRole('combobox', { name: /^Role of / })).toHaveLength(0);
    expect(screen.queryByTestId('invite-form')).toBeNull();
    designerView.unmount();

    mockApi({ 'GET /api/me': { body: demoMe('ilse', 'owner') }, [MEMBERS]: { body: demoMembers }, [INVITATIONS]: { body: [] } });
    renderApp('/t/kestrel-vale/members');
    await within(await screen.findByTestId('members-table')).findByText('Noor Halvorsen');
    expect(screen.getAllByRole('combobox', { name: /^Role of / })).toHaveLength(demoMembers.length);
    expect(screen.getByTestId('invite-form')).toBeTruthy();
  });

  it('sends PATCH with the new role when an owner picks one, and shows the server refusal', async () => {
    const calls = mockApi({
      'GET /api/me': { body: demoMe('ilse', 'owner') },
      [MEMBERS]: { body: demoMembers },
      [INVITATIONS]: { body: [] },
      [`PATCH /api/teams/${DEMO_TEAM_ID}/members/${demoMembers[0]?.userId}`]: {
        status: 409,
        body: { statusCode: 409, error: 'Conflict', message: 'A team needs at least one owner' },
      },
    });
    renderApp('/t/kestrel-vale/members');
    const select = await screen.findByTestId('role-select-ilse');
    fireEvent.change(select.querySelector('select') ?? select, { target: { value: 'viewer' } });
    expect(await screen.findByText('A team needs at least one owner')).toBeTruthy();
    const patch = calls.find((c) => c.key.startsWith('PATCH'));
    expect(patch?.body).toEqual({ role: 'viewer' });
  });

  it('shows the field issues of a rejected invitation next to the form', async () => {
    const calls = mockApi({
      'GET /api/me': { body: demoMe('ilse', 'owner') },
      [MEMBERS]: { body: demoMembers },
      [INVITATIONS]: { body: [] },
      [`POST /api/teams/${DEMO_TEAM_ID}/invitations`]: {
        status: 400,
        body: { statusCode: 400, error: 'Bad Request', message: 'Invalid body', issues: [{ path: 'email', message: 'Invalid email address' }] },
      },
    });
    renderApp('/t/kestrel-vale/members');
    const email = await screen.findByLabelText('E-mail address');
    fireEvent.change(email, { target: { value: 'wen@kestrel-vale.example' } });
    fireEvent.submit(screen.getByTestId('invite-form'));
    const callout = await screen.findByTestId('api-error');
    expect(within(callout).getByText('Invalid body')).toBeTruthy();
    expect(within(callout).getByText('email')).toBeTruthy();
    expect(callout.textContent).toContain('Invalid email address');
    await waitFor(() => expect(calls.some((c) => c.key.startsWith('POST'))).toBe(true));
    expect(calls.find((c) => c.key.startsWith('POST'))?.body).toEqual({ email: 'wen@kestrel-vale.example', role: 'designer' });
  });

  it('removes a member only after the owner confirms, then reloads the list', async () => {
    const dario = demoMembers[2];
    let removed = false;
    const calls = mockApi({
      'GET /api/me': { body: demoMe('ilse', 'owner') },
      [MEMBERS]: () => ({ body: removed ? demoMembers.filter((m) => m.login !== 'dario') : demoMembers }),
      [INVITATIONS]: { body: [] },
      [`DELETE /api/teams/${DEMO_TEAM_ID}/members/${dario?.userId}`]: () => {
        removed = true;
        return { status: 204 };
      },
    });
    renderApp('/t/kestrel-vale/members');
    fireEvent.click(await screen.findByTestId('remove-member-dario'));
    expect(calls.some((c) => c.key.startsWith('DELETE'))).toBe(false);
    const dialog = await screen.findByRole('alertdialog');
    expect(dialog.textContent).toContain('Dario Fennimore');
    fireEvent.click(within(dialog).getByRole('button', { name: 'Remove' }));
    const table = screen.getByTestId('members-table');
    await waitFor(() => expect(within(table).queryByText('Dario Fennimore')).toBeNull());
    expect(calls.filter((c) => c.key.startsWith('DELETE'))).toHaveLength(1);
  });
});

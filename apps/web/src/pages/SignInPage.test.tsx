// The sign-in page: its button follows the server's identity provider and keeps where the user was going.
import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '../test/mockApi.js';
import { renderApp } from '../test/renderApp.js';

afterEach(() => vi.unstubAllGlobals());

describe('SignInPage', () => {
  it('says "Sign in with GitHub" when the server signs in through GitHub', async () => {
    mockApi({ 'GET /api/auth/providers': { body: { provider: 'github' } } });
    renderApp('/signin');
    const button = await screen.findByTestId('signin-button');
    expect(button.textContent).toBe('Sign in with GitHub');
    expect(screen.queryByTestId('local-idp-note')).toBeNull();
  });

  it('says "Sign in" with a development note for the local identity provider', async () => {
    mockApi({ 'GET /api/auth/providers': { body: { provider: 'local' } } });
    renderApp('/signin');
    const button = await screen.findByTestId('signin-button');
    expect(button.textContent).toBe('Sign in');
    expect(screen.getByTestId('local-idp-note').textContent).toBe('local identity provider (development)');
  });

  it('links the button to /api/auth/login with the page the user was going to', async () => {
    mockApi({ 'GET /api/auth/providers': { body: { provider: 'local' } } });
    renderApp('/signin?returnTo=%2Ft%2Fkestrel-vale%2Fmembers');
    const button = await screen.findByTestId('signin-button');
    expect(button.getAttribute('href')).toBe('/api/auth/login?returnTo=%2Ft%2Fkestrel-vale%2Fmembers');
  });

  it('sends a visitor without a session from a team page to sign-in, remembering that page', async () => {
    mockApi({
      'GET /api/me': { status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'Sign in first' } },
      'GET /api/auth/providers': { body: { provider: 'local' } },
    });
    const { router } = renderApp('/t/kestrel-vale');
    const button = await screen.findByTestId('signin-button');
    expect(router.state.location.pathname).toBe('/signin');
    expect(router.state.location.search).toBe('?returnTo=%2Ft%2Fkestrel-vale');
    expect(button.getAttribute('href')).toBe('/api/auth/login?returnTo=%2Ft%2Fkestrel-vale');
  });
});

// apiFetch: JSON in and out, the API's error body turned into ApiRequestError.
import { healthSchema } from '@hexloom/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '../../../test/mockApi.js';
import { apiFetch } from './apiFetch.js';
import { ApiRequestError } from './ApiRequestError.js';
import { ApiResponseError } from './ApiResponseError.js';

afterEach(() => vi.unstubAllGlobals());

describe('apiFetch', () => {
  it('turns an error JSON into an ApiRequestError carrying status, message and field issues', async () => {
    mockApi({
      'POST /api/teams': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Invalid body',
          issues: [{ path: 'slug', message: 'lower-case letters, digits and dashes, 2 to 40 characters' }],
        },
      },
    });
    const error = await apiFetch('/api/teams', undefined, { method: 'POST', body: { name: 'X', slug: 'Bad' } }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiRequestError);
    const requestError = error as ApiRequestError;
    expect(requestError.name).toBe('ApiRequestError');
    expect(requestError.statusCode).toBe(400);
    expect(requestError.message).toBe('Invalid body');
    expect(requestError.issues).toEqual([{ path: 'slug', message: 'lower-case letters, digits and dashes, 2 to 40 characters' }]);
    expect(requestError.request).toBe('POST /api/teams');
  });

  it('still throws an ApiRequestError with the HTTP status when the error body is not the API shape', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>Bad Gateway</html>', { status: 502, statusText: 'Bad Gateway' })));
    const error = (await apiFetch('/api/me', undefined).catch((e: unknown) => e)) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.statusCode).toBe(502);
    expect(error.issues).toEqual([]);
    expect(error.message).toBe('The server failed (502 Bad Gateway) without saying why. Try again in a moment.');
    expect(error.request).toBe('GET /api/me');
  });

  it('parses a 2xx answer through the contract schema and sends JSON with the session cookie', async () => {
    const health = { status: 'ok', version: '0.1.0', database: 'ok', uptimeS: 12.5 };
    mockApi({ 'GET /api/health': { body: health } });
    await expect(apiFetch('/api/health', healthSchema)).resolves.toEqual(health);
    const [, init] = vi.mocked(fetch).mock.calls[0] ?? [];
    expect(init?.credentials).toBe('same-origin');
  });

  it('rejects a 2xx answer that breaks the contract with an ApiResponseError naming the request', async () => {
    mockApi({ 'GET /api/health': { body: { status: 'degraded' } } });
    const error = await apiFetch('/api/health', healthSchema).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiResponseError);
    expect((error as Error).message).toContain('GET /api/health');
  });

  it('resolves to undefined for a 204 answer', async () => {
    mockApi({ 'POST /api/auth/logout': { status: 204 } });
    await expect(apiFetch('/api/auth/logout', undefined, { method: 'POST' })).resolves.toBeUndefined();
  });
});

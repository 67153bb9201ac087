// The one place the web app talks HTTP to the Hexloom API.
import { apiErrorSchema } from '@hexloom/contracts';
import { ApiRequestError } from './ApiRequestError.js';
import { ApiResponseError } from './ApiResponseError.js';

/** Anything with a zod-like `parse` (the schemas of @hexloom/contracts). */
export type ResponseSchema<T> = { parse(data: unknown): T };

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export type ApiFetchOptions = {
  method?: HttpMethod;
  /** Sent as JSON. */
  body?: unknown;
  /** Sent as multipart/form-data instead of `body` (file uploads; the browser sets the boundary). */
  form?: FormData;
  signal?: AbortSignal;
};

/**
 * Calls the API at `path` (starting with /api) with the session cookie.
 * With a `schema`, parses the JSON answer through it; without, expects no body (e.g. 204).
 * @throws ApiRequestError for a non-2xx answer (carrying statusCode, message, issues)
 * @throws ApiResponseError when a 2xx answer does not match `schema`
 */
export async function apiFetch<T>(path: string, schema: ResponseSchema<T>, options?: ApiFetchOptions): Promise<T>;
export async function apiFetch(path: string, schema?: undefined, options?: ApiFetchOptions): Promise<void>;
export async function apiFetch<T>(path: string, schema?: ResponseSchema<T>, options: ApiFetchOptions = {}): Promise<T | void> {
  const method = options.method ?? 'GET';
  const request = `${method} ${path}`;
  const headers: Record<string, string> = { accept: 'application/json' };
  const init: RequestInit = { method, headers, credentials: 'same-origin' };
  if (options.form !== undefined) {
    init.body = options.form;
  } else if (options.body !== undefined) {
    headers['content-type'] = 'application/json';
    init.body = JSON.stringify(options.body);
  }
  if (options.signal) init.signal = options.signal;

  const response = await fetch(path, init);
  const text = await response.text();
  const json = parseJson(text);

  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(json);
    if (parsed.success) throw new ApiRequestError({ ...parsed.data, request });
    throw new ApiRequestError({
      statusCode: response.status,
      error: response.statusText || 'Error',
      message: response.status >= 500 ? `The server failed (${response.status}${response.statusText ? ` ${response.statusText}` : ''}) without saying why. Try again in a moment.` : `The server refused the request (${response.status}${response.statusText ? ` ${response.statusText}` : ''}) without saying why.`,
      request,
    });
  }
  if (!schema) return;
  if (json === undefined) throw new ApiResponseError(request, 'the body is empty or not JSON');
  try {
    return schema.parse(json);
  } catch (error) {
    throw new ApiResponseError(request, error instanceof Error ? error.message : String(error));
  }
}

function parseJson(text: string): unknown {
  if (text.trim() === '') return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

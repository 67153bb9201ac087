// Sends one file as multipart/form-data (field "file") to the API, with the same error handling as apiFetch.
import { apiErrorSchema } from '@hexloom/contracts';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiResponseError } from '../../core/api/ApiResponseError.js';
import type { ResponseSchema } from '../../core/api/apiFetch.js';

/**
 * POSTs or PUTs `file` to `path` in the multipart field `file` (the upload routes of the chip API), with the session
 * cookie, and parses the JSON answer through `schema`.
 * @throws ApiRequestError for a non-2xx answer (the server's message and issues, e.g. each bad CSV line)
 * @throws ApiResponseError when a 2xx answer does not match `schema`
 */
export async function uploadFile<T>(path: string, file: File, schema: ResponseSchema<T>, method: 'POST' | 'PUT' = 'POST'): Promise<T> {
  const request = `${method} ${path}`;
  const form = new FormData();
  form.append('file', file, file.name);
  const response = await fetch(path, { method, body: form, headers: { accept: 'application/json' }, credentials: 'same-origin' });
  const text = await response.text();
  let json: unknown;
  try {
    json = text.trim() === '' ? undefined : (JSON.parse(text) as unknown);
  } catch {
    json = undefined;
  }
  if (!response.ok) {
    const parsed = apiErrorSchema.safeParse(json);
    if (parsed.success) throw new ApiRequestError({ ...parsed.data, request });
    throw new ApiRequestError({ statusCode: response.status, error: response.statusText || 'Error', message: `HTTP ${response.status} from ${request}`, request });
  }
  try {
    return schema.parse(json);
  } catch (error) {
    throw new ApiResponseError(request, error instanceof Error ? error.message : String(error));
  }
}

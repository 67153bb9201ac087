// Sends one file as multipart/form-data (field "file") through apiFetch, as the upload routes of the chip API expect.
import { apiFetch, type ResponseSchema } from '../../core/api/apiFetch.js';

/**
 * POSTs or PUTs `file` to `path` in the multipart field `file`, and parses the JSON answer through `schema`.
 * @throws ApiRequestError for a non-2xx answer (the server's message and issues, e.g. each bad CSV line)
 * @throws ApiResponseError when a 2xx answer does not match `schema`
 */
export function uploadFile<T>(path: string, file: File, schema: ResponseSchema<T>, method: 'POST' | 'PUT' = 'POST'): Promise<T> {
  const form = new FormData();
  form.append('file', file, file.name);
  return apiFetch(path, schema, { method, form });
}

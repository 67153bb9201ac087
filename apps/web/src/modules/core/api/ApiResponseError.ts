// The error thrown by apiFetch when a 2xx answer does not match the expected contract schema.

/** A successful answer whose body does not have the shape the contract promises. */
export class ApiResponseError extends Error {
  override readonly name = 'ApiResponseError';
  /** "METHOD /api/path" of the request. */
  readonly request: string;

  constructor(request: string, detail: string) {
    super(`Unexpected answer from ${request}: ${detail}`);
    this.request = request;
  }
}

// The error thrown by apiFetch when the API answers with a non-2xx status.
import type { FieldIssue } from '@hexloom/contracts';

/** A failed API request, carrying the server's JSON error body (statusCode, message, issues). */
export class ApiRequestError extends Error {
  override readonly name = 'ApiRequestError';
  /** HTTP status code of the answer, e.g. 400, 401, 409. */
  readonly statusCode: number;
  /** Short HTTP reason, e.g. "Bad Request". */
  readonly error: string;
  /** Offending fields named by the server (empty when it named none). */
  readonly issues: readonly FieldIssue[];
  /** "METHOD /api/path" of the failed request. */
  readonly request: string;

  constructor(params: { statusCode: number; error: string; message: string; issues?: readonly FieldIssue[]; request: string }) {
    super(params.message);
    this.statusCode = params.statusCode;
    this.error = params.error;
    this.issues = params.issues ?? [];
    this.request = params.request;
  }
}

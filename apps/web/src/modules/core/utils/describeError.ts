// A failed request in words for a toast or a callout: the server's own message, or what happened in plain terms.
import { ApiRequestError } from '../api/ApiRequestError.js';
import { ApiResponseError } from '../api/ApiResponseError.js';

/** Never a raw "HTTP 500 from POST /api/..." or validator text: those stay on the error for the developer tools. */
export function describeError(error: unknown): string {
  if (error instanceof ApiRequestError) return error.message;
  if (error instanceof ApiResponseError) return 'The server answered in a form this page does not understand. Reload the page; if it happens again, the server and the web app may be of different versions.';
  if (error instanceof TypeError) return 'Hexloom could not reach its server. Check the connection and try again.';
  return error instanceof Error && error.message ? error.message : 'Something went wrong.';
}

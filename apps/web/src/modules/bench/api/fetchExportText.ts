// Reads an export file as text (JSON, CSV or Touchstone) with the session cookie; refusals become typed errors.
import { apiErrorSchema, driveLimitErrorSchema } from '@hexloom/contracts';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { DriveLimitRequestError } from './DriveLimitRequestError.js';

/** The text of an export and the file name the server proposed (Content-Disposition), if any. */
export type ExportText = { text: string; fileName: string | null };

const parseJson = (text: string): unknown => {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
};

/** The `filename` of a Content-Disposition header. */
function attachmentName(header: string | null): string | null {
  const match = header ? /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(header) : null;
  return match?.[1] ? decodeURIComponent(match[1]) : null;
}

/**
 * GETs `path` as text. apiFetch parses JSON only and keeps only the standard error members, while the
 * exports are CSV or Touchstone text and the drive-limit refusal carries a list of violations: hence this reader.
 * @throws DriveLimitRequestError for the 422 listing shifters beyond their limits
 * @throws ApiRequestError for any other non-2xx answer (the server's message and issues)
 */
export async function fetchExportText(path: string, signal?: AbortSignal): Promise<ExportText> {
  const request = `GET ${path}`;
  const init: RequestInit = { method: 'GET', credentials: 'same-origin', headers: { accept: 'application/json, text/csv, text/plain' } };
  if (signal) init.signal = signal;
  const response = await fetch(path, init);
  const text = await response.text();
  if (response.ok) return { text, fileName: attachmentName(response.headers.get('content-disposition')) };
  const json = parseJson(text);
  const limits = driveLimitErrorSchema.safeParse(json);
  if (limits.success) throw new DriveLimitRequestError({ message: limits.data.message, request, violations: limits.data.violations, cautions: limits.data.cautions });
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) throw new ApiRequestError({ ...parsed.data, request });
  const reason = `${response.status}${response.statusText ? ` ${response.statusText}` : ''}`;
  throw new ApiRequestError({
    statusCode: response.status,
    error: response.statusText || 'Error',
    message: response.status >= 500 ? `The server failed (${reason}) without saying why. Try again in a moment.` : `The server refused the export (${reason}) without saying why.`,
    request,
  });
}

/** Checks an uploaded file's type by extension and content (UTF-8 text, no NUL bytes) and returns its text. */
import { DomainError } from './domain-error.js';

/** Largest accepted upload, bytes (multer refuses bigger files with 413). */
export const MAX_UPLOAD_BYTES = 2 * 1024 * 1024;

/** The request carried no file in the `file` field. */
export class MissingFileError extends DomainError {
  override readonly name = 'MissingFileError';
  readonly kind = 'invalid';
  constructor() {
    super('Attach the file in the multipart field "file"', [{ path: 'file', message: 'required' }]);
  }
}

/** The file's name or content is not of an accepted type. */
export class UnsupportedUploadError extends DomainError {
  override readonly name = 'UnsupportedUploadError';
  readonly kind = 'unsupported';
  constructor(fileName: string, reason: string) {
    super(`File "${fileName}" is not accepted: ${reason}`, [{ path: 'file', message: reason }]);
  }
}

/** The upload is too big (thrown when a size limit is checked outside multer). */
export class UploadTooLargeError extends DomainError {
  override readonly name = 'UploadTooLargeError';
  readonly kind = 'too_large';
  constructor(fileName: string, sizeBytes: number, limitBytes: number) {
    super(`File "${fileName}" has ${sizeBytes} bytes; the limit is ${limitBytes}`);
  }
}

/** What multer hands a handler (the fields used here). */
export type UploadedFileLike = { originalname: string; size: number; buffer: Buffer };

/**
 * Returns the file's text when its name ends in one of `extensions` (case-insensitive regexes allowed)
 * and its bytes are valid UTF-8 without NUL bytes; otherwise 415. No file: 400.
 */
export function uploadedText(file: UploadedFileLike | undefined, extensions: readonly RegExp[]): { text: string; fileName: string; sizeBytes: number } {
  if (!file) throw new MissingFileError();
  const fileName = file.originalname;
  if (!extensions.some((re) => re.test(fileName))) throw new UnsupportedUploadError(fileName, `the name must end in ${extensions.map((e) => e.source.replace(/\\/g, '').replace(/\$$/, '')).join(' or ')}`);
  if (file.size > MAX_UPLOAD_BYTES) throw new UploadTooLargeError(fileName, file.size, MAX_UPLOAD_BYTES);
  if (file.buffer.includes(0)) throw new UnsupportedUploadError(fileName, 'it holds NUL bytes (binary data, not text)');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(file.buffer);
  } catch {
    throw new UnsupportedUploadError(fileName, 'it is not valid UTF-8 text');
  }
  return { text: text.replace(/^\uFEFF/, ''), fileName, sizeBytes: file.size };
}

import { describe, expect, it } from 'vitest';
import { ApiRequestError } from '../api/ApiRequestError.js';
import { ApiResponseError } from '../api/ApiResponseError.js';
import { describeError } from './describeError.js';

describe('describeError', () => {
  it("gives the server's own message, and plain words for a lost connection or a strange answer", () => {
    expect(describeError(new ApiRequestError({ statusCode: 413, error: 'Payload Too Large', message: 'The file is larger than 5 MB.', request: 'POST /api/x' }))).toBe('The file is larger than 5 MB.');
    expect(describeError(new TypeError('Failed to fetch'))).toMatch(/could not reach its server/);
    expect(describeError(new ApiResponseError('GET /api/x', 'bad'))).not.toContain('/api/');
  });
});

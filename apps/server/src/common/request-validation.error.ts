/** The error thrown when a body, query or path parameters fail their schema. */
import type { z } from 'zod';
import { DomainError, type DomainIssue } from './domain-error.js';

/** Where the rejected input came from. */
export type InputLocation = 'body' | 'query' | 'params';

/** A request whose input failed validation; lists every offending field. */
export class RequestValidationError extends DomainError {
  override readonly name = 'RequestValidationError';
  readonly kind = 'invalid';

  constructor(location: InputLocation, issues: DomainIssue[]) {
    super(`Invalid ${location}: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues);
  }

  /** Builds the error from zod issues; a root-level issue is reported under the location's name. */
  static fromZod(location: InputLocation, error: z.ZodError): RequestValidationError {
    return new RequestValidationError(
      location,
      error.issues.map((issue) => ({
        path: issue.path.length > 0 ? issue.path.map(String).join('.') : location,
        message: issue.message,
      })),
    );
  }
}

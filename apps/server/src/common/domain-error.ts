/** Base class of domain errors; the one exception filter maps their kind to an HTTP status. */

/** What went wrong, independent of HTTP. */
export type DomainErrorKind = 'invalid' | 'conflict' | 'unauthorized' | 'forbidden' | 'not_found' | 'unprocessable' | 'too_large' | 'unsupported' | 'too_many';

/** One offending field of a rejected input. */
export type DomainIssue = { path: string; message: string };

/** A failure the client can fix; `name` is stable and `message` names the bad value. */
export abstract class DomainError extends Error {
  abstract readonly kind: DomainErrorKind;
  /** Offending fields, when the error is about specific inputs. */
  readonly issues: DomainIssue[] | undefined;

  /** Extra members of the error answer (e.g. the newer version of a stale save), when the client needs them. */
  readonly extra: Record<string, unknown> | undefined;

  constructor(message: string, issues?: DomainIssue[], extra?: Record<string, unknown>) {
    super(message);
    this.issues = issues;
    this.extra = extra;
  }
}

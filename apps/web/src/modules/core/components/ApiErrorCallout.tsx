// Shows a failed request: the server's message and, when it named them, the offending fields.
import { Button, Callout } from '@blueprintjs/core';
import { ApiRequestError } from '../api/ApiRequestError.js';
import { describeError } from '../utils/describeError.js';

export type ApiErrorCalloutProps = {
  /** The error to show; nothing is rendered when null or undefined. */
  error: Error | null | undefined;
  /** What was being attempted, e.g. "Could not send the invitation". */
  title: string;
  /** Offers "Try again" (e.g. a query's refetch). */
  onRetry?: () => void;
};

/** A danger Callout with the error message and a list of field issues. */
export function ApiErrorCallout({ error, title, onRetry }: ApiErrorCalloutProps) {
  if (!error) return null;
  const issues = error instanceof ApiRequestError ? error.issues : [];
  return (
    <Callout intent="danger" title={title} icon="error" role="alert" data-testid="api-error">
      <p style={{ margin: 0 }}>{describeError(error)}</p>
      {issues.length > 0 ? (
        <ul style={{ margin: '6px 0 0', paddingLeft: 20 }}>
          {issues.map((issue) => (
            <li key={`${issue.path}:${issue.message}`}>
              <code className="hx-mono">{issue.path || '(body)'}</code>: {issue.message}
            </li>
          ))}
        </ul>
      ) : null}
      {onRetry ? <Button style={{ marginTop: 8 }} icon="refresh" text="Try again" onClick={onRetry} /> : null}
    </Callout>
  );
}

// Shows a failed request: the server's message and, when it named them, the offending fields.
import { Callout } from '@blueprintjs/core';
import { ApiRequestError } from '../api/ApiRequestError.js';

export type ApiErrorCalloutProps = {
  /** The error to show; nothing is rendered when null or undefined. */
  error: Error | null | undefined;
  /** What was being attempted, e.g. "Could not send the invitation". */
  title: string;
};

/** A danger Callout with the error message and a list of field issues. */
export function ApiErrorCallout({ error, title }: ApiErrorCalloutProps) {
  if (!error) return null;
  const issues = error instanceof ApiRequestError ? error.issues : [];
  return (
    <Callout intent="danger" title={title} icon="error" role="alert" data-testid="api-error">
      <p style={{ margin: 0 }}>{error.message}</p>
      {issues.length > 0 ? (
        <ul style={{ margin: '6px 0 0', paddingLeft: 20 }}>
          {issues.map((issue) => (
            <li key={`${issue.path}:${issue.message}`}>
              <code className="hx-mono">{issue.path || '(body)'}</code>: {issue.message}
            </li>
          ))}
        </ul>
      ) : null}
    </Callout>
  );
}

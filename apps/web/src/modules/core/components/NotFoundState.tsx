// "Nothing here" state, for unknown paths and teams the user cannot see.
import { NonIdealState } from '@blueprintjs/core';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ROUTES } from '../../../routes.js';

export type NotFoundStateProps = { title?: string; description?: ReactNode };

/** A NonIdealState with data-testid="not-found" and a link back home. */
export function NotFoundState({ title = 'Page not found', description }: NotFoundStateProps) {
  return (
    <div data-testid="not-found" style={{ padding: '48px 0' }}>
      <NonIdealState
        icon="path-search"
        title={title}
        description={description ?? 'There is no page at this address.'}
        action={<Link to={ROUTES.root}>Go to your team</Link>}
      />
    </div>
  );
}

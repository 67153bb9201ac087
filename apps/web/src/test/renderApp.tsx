// Renders the whole app at a path with a memory router and a fresh, non-retrying query client.
import { render } from '@testing-library/react';
import { createMemoryRouter } from 'react-router-dom';
import { AppProviders } from '../AppProviders.js';
import { appRoutes } from '../appRoutes.js';
import { createQueryClient } from '../modules/core/api/createQueryClient.js';

/** Mounts the app at `path`; returns the router so tests can read the current location. */
export function renderApp(path: string) {
  const router = createMemoryRouter(appRoutes, { initialEntries: [path] });
  const queryClient = createQueryClient({ retries: 0 });
  const view = render(<AppProviders queryClient={queryClient} router={router} />);
  return { ...view, router };
}

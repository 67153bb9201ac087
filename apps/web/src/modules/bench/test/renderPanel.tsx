// Mounts one panel alone under a team route, with a fresh non-retrying query client.
import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { MemoryRouter, Route, Routes } from 'react-router-dom';
import { createQueryClient } from '../../core/api/createQueryClient.js';

/** Renders `panel` at /t/kestrel-vale/panel (so team links resolve); returns the user-event driver too. */
export function renderPanel(panel: ReactElement) {
  const user = userEvent.setup();
  const view = render(
    <QueryClientProvider client={createQueryClient({ retries: 0 })}>
      <BlueprintProvider>
        <MemoryRouter initialEntries={['/t/kestrel-vale/panel']}>
          <Routes>
            <Route path="/t/:teamSlug/panel" element={panel} />
          </Routes>
        </MemoryRouter>
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return { ...view, user };
}

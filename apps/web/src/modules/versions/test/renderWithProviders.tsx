// Test helper: renders one panel with a fresh non-retrying query client, Blueprint and a memory router.
import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { createQueryClient } from '../../core/api/createQueryClient.js';

/** Mounts `ui` at `path` (the router only serves links here); returns the testing-library view. */
export function renderWithProviders(ui: ReactNode, path = '/t/kestrel-vale') {
  const queryClient = createQueryClient({ retries: 0 });
  return render(
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <MemoryRouter initialEntries={[path]}>{ui}</MemoryRouter>
      </BlueprintProvider>
    </QueryClientProvider>,
  );
}

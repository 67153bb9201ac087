// Mounts the new-circuit drawer alone, with a fresh non-retrying query client and a spy for onAccept.
import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { vi } from 'vitest';
import { createQueryClient } from '../../core/api/createQueryClient.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { NewCircuitDrawer, type NewCircuitDrawerProps } from '../components/NewCircuitDrawer.js';
import { demoPorts, SYNTH_CONFIGURATION_ID } from './demoSynthesis.js';

/** Renders an open drawer on version 2 of the demo configuration; returns the user-event driver and the spies. */
export function renderNewCircuitDrawer(overrides: Partial<NewCircuitDrawerProps> = {}) {
  const onAccept = vi.fn<NewCircuitDrawerProps['onAccept']>();
  const onClose = vi.fn();
  const user = userEvent.setup();
  const props: NewCircuitDrawerProps = {
    isOpen: true,
    onClose,
    teamId: DEMO_TEAM_ID,
    configurationId: SYNTH_CONFIGURATION_ID,
    versionNumber: 2,
    ports: demoPorts,
    existingCircuitIds: ['delay-a'],
    onAccept,
    ...overrides,
  };
  const view = render(
    <QueryClientProvider client={createQueryClient({ retries: 0 })}>
      <BlueprintProvider>
        <NewCircuitDrawer {...props} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return { ...view, user, onAccept, onClose };
}

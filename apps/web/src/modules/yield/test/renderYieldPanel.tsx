// Mounts the yield panel alone on a version of the ring-notch example, with a fake event stream and a fresh query client.
import { BlueprintProvider } from '@blueprintjs/core';
import type { ConfigurationFile, ConfigurationVersion, TeamRole } from '@hexloom/contracts';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createQueryClient } from '../../core/api/createQueryClient.js';
import { ringNotchContent } from '../../response/testing/ringNotchContent.js';
import { DEMO_CONFIGURATION_ID } from '../../../test/demoChip.js';
import { DEMO_TEAM_ID } from '../../../test/demoTeam.js';
import { YieldPanel } from '../components/YieldPanel.js';
import { EventSourceFactoryContext } from '../hooks/EventSourceFactoryContext.js';
import { fakeEventSources } from './FakeEventSource.js';

export const YIELD_VERSION_ID = '1e5f6a7b-8c9d-4e0f-8a1b-3c4d5e6f7a8b';
export const JOB_ID = '2f6a7b8c-9d0e-4f1a-9b2c-4d5e6f7a8b9c';
export const JOBS = `/api/teams/${DEMO_TEAM_ID}/configurations/${DEMO_CONFIGURATION_ID}/versions/3/yield-jobs`;

/** Version 3 of the demo configuration holding the ring notch, with the chip's spreads stated when `tolerance` is given. */
export function yieldVersion(tolerance?: { couplerSigmaRad: number; phaseSigmaRad: number }): ConfigurationVersion {
  const base = ringNotchContent();
  const content: ConfigurationFile = tolerance ? { ...base, mesh: { ...base.mesh, technology: { ...base.mesh.technology, tolerance } } } : base;
  return { id: YIELD_VERSION_ID, configurationId: DEMO_CONFIGURATION_ID, number: 3, status: 'draft', author: 'noor', note: '', createdAt: '2026-12-01T09:00:00.000Z', content, specs: [], figures: {}, approvedBy: null, approvedAt: null, deadGatesInUse: [] };
}

/** A job answer of the API. */
export function yieldJob(over: Partial<{ status: 'running' | 'done' | 'cancelled' | 'failed' | 'interrupted'; runsDone: number; runsTotal: number; summary: unknown; error: string | null }> = {}) {
  return { id: JOB_ID, versionId: YIELD_VERSION_ID, status: 'running', runsDone: 0, runsTotal: 200, summary: null, error: null, createdBy: 'noor', createdAt: '2026-12-01T10:00:00.000Z', ...over };
}

/** Renders the panel for `role`; returns the user-event driver and the fake streams it opened. */
export function renderYieldPanel(role: TeamRole, version = yieldVersion()) {
  const streams = fakeEventSources();
  const user = userEvent.setup();
  const view = render(
    <QueryClientProvider client={createQueryClient({ retries: 0 })}>
      <BlueprintProvider>
        <EventSourceFactoryContext.Provider value={streams.factory}>
          <YieldPanel teamId={DEMO_TEAM_ID} configurationId={DEMO_CONFIGURATION_ID} version={version} role={role} />
        </EventSourceFactoryContext.Provider>
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return { ...view, user, streams };
}

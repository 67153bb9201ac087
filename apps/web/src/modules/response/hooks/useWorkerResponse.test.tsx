// useWorkerResponse through an injected in-thread solver: the answer equals the shared simulation, errors in words.
import { renderHook, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ringNotchContent } from '../testing/ringNotchContent.js';
import { computeSpectra } from '../utils/computeSpectra.js';
import { createInThreadSolver } from '../workers/createInThreadSolver.js';
import type { SolverWorkerFactory } from '../workers/solverWorkerLike.js';
import { useWorkerResponse } from './useWorkerResponse.js';

const content = ringNotchContent();
const grid = { kind: 'fsr', points: 256 } as const;

describe('useWorkerResponse', () => {
  it('answers through the injected worker with the spectra of the shared simulation function', async () => {
    const factory = vi.fn(createInThreadSolver);
    const { result } = renderHook(() => useWorkerResponse({ content, pairs: [{ from: 'in', to: 'out' }], grid }, factory));
    expect(result.current.computing).toBe(true);
    await waitFor(() => expect(result.current.spectra).toBeDefined());
    expect(result.current.computing).toBe(false);
    expect(result.current.error).toBeUndefined();
    expect(result.current.spectra).toEqual(computeSpectra({ content, pairs: [{ from: 'in', to: 'out' }], grid }));
    expect(factory).toHaveBeenCalledTimes(1);
  });

  it('shows the newest answer after quick changes and never an older one after it', async () => {
    const posted: number[] = [];
    const factory: SolverWorkerFactory = () => {
      const inner = createInThreadSolver();
      return { ...inner, postMessage: (r) => (posted.push(r.id), inner.postMessage(r)), set onmessage(h) { inner.onmessage = h; }, get onmessage() { return inner.onmessage; } };
    };
    const { result, rerender } = renderHook(({ to }) => useWorkerResponse({ content, pairs: [{ from: 'in', to }], grid }, factory), { initialProps: { to: 'in' } });
    rerender({ to: 'out' });
    await waitFor(() => expect(result.current.computing).toBe(false));
    expect(posted.length).toBe(2);
    expect(result.current.spectra?.[0]?.toName).toBe('out');
  });

  it('gives the solver message in words for an unknown port, and computes nothing without pairs', async () => {
    const { result } = renderHook(() => useWorkerResponse({ content, pairs: [{ from: 'in', to: 'E99' }], grid }, createInThreadSolver));
    await waitFor(() => expect(result.current.error).toMatch(/"E99".*not a port id or label of this chip/));
    const factory = vi.fn(createInThreadSolver);
    const empty = renderHook(() => useWorkerResponse({ content, pairs: [], grid }, factory));
    expect(empty.result.current).toEqual({ spectra: undefined, computing: false });
    expect(factory).not.toHaveBeenCalled();
  });
});

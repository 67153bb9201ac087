import { act, renderHook } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SMALL_CONTENT, SMALL_GATES } from '../test/smallContent.js';
import { setGateSetting } from '../utils/setGateSetting.js';
import { useUndoableDraft } from './useUndoableDraft.js';

const base = { content: SMALL_CONTENT, specs: [], figures: {} };
const withKappa = (k: number) => ({ ...base, content: setGateSetting(SMALL_CONTENT, SMALL_GATES[0]!, { state: 'split', kappa: k }) });

describe('useUndoableDraft', () => {
  it('undoes and redoes edits, and is dirty only while the draft differs from its base', () => {
    const { result } = renderHook(() => useUndoableDraft(base));
    expect(result.current.dirty).toBe(false);
    act(() => result.current.edit(withKappa(0.2)));
    act(() => result.current.edit(withKappa(0.4)));
    expect(result.current.draft.content.gates[0]!.kappa).toBe(0.4);
    act(() => result.current.undo());
    expect(result.current.draft.content.gates[0]!.kappa).toBe(0.2);
    act(() => result.current.undo());
    expect(result.current.dirty).toBe(false);
    expect(result.current.canUndo).toBe(false);
    act(() => result.current.redo());
    expect(result.current.draft.content.gates[0]!.kappa).toBe(0.2);
    expect(result.current.canRedo).toBe(true);
  });

  it('makes one undo step of a slider drag (edits with the same coalescing key)', () => {
    const { result } = renderHook(() => useUndoableDraft(base));
    for (const k of [0.1, 0.2, 0.3, 0.4]) act(() => result.current.edit(withKappa(k), 'g:kappa'));
    act(() => result.current.undo());
    expect(result.current.draft).toBe(base);
  });

  it('starts over from a new base after a save', () => {
    const { result } = renderHook(() => useUndoableDraft(base));
    act(() => result.current.edit(withKappa(0.3)));
    const saved = result.current.draft;
    act(() => result.current.reset(saved));
    expect(result.current.dirty).toBe(false);
    expect(result.current.canUndo).toBe(false);
  });
});

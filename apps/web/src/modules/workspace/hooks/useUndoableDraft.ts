// Undo and redo of the edits made in the workspace, over whole drafts.
import { useCallback, useState } from 'react';
import type { WorkspaceDraft } from '../utils/workspaceDraft.js';

const LIMIT = 200;

export type UndoableDraft = {
  draft: WorkspaceDraft;
  /** A new edit (clears the redo list). `coalesce` merges it with the previous edit of the same key (a slider drag). */
  edit: (next: WorkspaceDraft, coalesce?: string) => void;
  undo: () => void;
  redo: () => void;
  canUndo: boolean;
  canRedo: boolean;
  /** Starts over from `base` (after a save or when another version is opened). */
  reset: (base: WorkspaceDraft) => void;
  /** True when the draft differs from the last base. */
  dirty: boolean;
};

type History = { past: WorkspaceDraft[]; present: WorkspaceDraft; future: WorkspaceDraft[]; base: WorkspaceDraft; lastKey: string | undefined };

/** Keeps up to 200 steps of history. */
export function useUndoableDraft(initial: WorkspaceDraft): UndoableDraft {
  const [h, setH] = useState<History>({ past: [], present: initial, future: [], base: initial, lastKey: undefined });
  const edit = useCallback((next: WorkspaceDraft, coalesce?: string) => {
    setH((s) => {
      if (coalesce && s.lastKey === coalesce) return { ...s, present: next, future: [] };
      return { ...s, past: [...s.past, s.present].slice(-LIMIT), present: next, future: [], lastKey: coalesce };
    });
  }, []);
  const undo = useCallback(() => setH((s) => (s.past.length === 0 ? s : { ...s, past: s.past.slice(0, -1), present: s.past[s.past.length - 1]!, future: [s.present, ...s.future], lastKey: undefined })), []);
  const redo = useCallback(() => setH((s) => (s.future.length === 0 ? s : { ...s, past: [...s.past, s.present], present: s.future[0]!, future: s.future.slice(1), lastKey: undefined })), []);
  const reset = useCallback((base: WorkspaceDraft) => setH({ past: [], present: base, future: [], base, lastKey: undefined }), []);
  return { draft: h.present, edit, undo, redo, canUndo: h.past.length > 0, canRedo: h.future.length > 0, reset, dirty: h.present !== h.base };
}

// Keyboard shortcuts of the workspace (see utils/workspaceShortcuts.ts), ignored while typing in a field.
import { useEffect } from 'react';

export type WorkspaceKeyActions = { undo: () => void; redo: () => void; save: () => void; newCircuit: () => void; clear: () => void; help: () => void };

function typing(target: EventTarget | null): boolean {
  return target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));
}

/** Listens on the document while mounted. */
export function useWorkspaceKeys(actions: WorkspaceKeyActions): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      if (mod && key === 's') return (e.preventDefault(), actions.save());
      if (typing(e.target)) return;
      if (mod && key === 'z') return (e.preventDefault(), e.shiftKey ? actions.redo() : actions.undo());
      if (mod && key === 'y') return (e.preventDefault(), actions.redo());
      if (mod || e.altKey) return;
      if (key === 'n') actions.newCircuit();
      else if (key === 'escape') actions.clear();
      else if (e.key === '?') actions.help();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [actions]);
}

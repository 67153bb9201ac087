// Keyboard shortcuts of the configuration workspace, listed in its help dialog.

/** Keys and what they do (the canvas adds its own: fit, zoom, pan). */
export const WORKSPACE_SHORTCUTS: { keys: string; action: string }[] = [
  { keys: 'Ctrl+Z', action: 'Undo the last edit' },
  { keys: 'Ctrl+Shift+Z or Ctrl+Y', action: 'Redo' },
  { keys: 'Ctrl+S', action: 'Save as a new version' },
  { keys: 'N', action: 'New circuit' },
  { keys: 'Esc', action: 'Clear the gate selection' },
  { keys: '?', action: 'Show these shortcuts' },
];

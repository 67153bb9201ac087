// Keyboard shortcuts of the mesh canvas, for the canvas itself and for help dialogs.

/** One shortcut: the keys and what they do. */
export type MeshCanvasShortcut = { keys: string; action: string };

/** Every keyboard shortcut of MeshCanvas (active while the canvas or one of its gates has focus). */
export const MESH_CANVAS_SHORTCUTS: MeshCanvasShortcut[] = [
  { keys: 'f', action: 'Fit the whole mesh in view' },
  { keys: '+', action: 'Zoom in' },
  { keys: '-', action: 'Zoom out' },
  { keys: 'Arrow keys', action: 'Pan the view' },
  { keys: 'Tab', action: 'Move to the next gate' },
  { keys: 'Enter or Space', action: 'Click the focused gate' },
];

// The keyboard shortcuts of the mesh canvas in a dialog.
import { Dialog, DialogBody, HTMLTable } from '@blueprintjs/core';
import { MESH_CANVAS_SHORTCUTS } from '../../mesh-canvas/utils/meshCanvasShortcuts.js';

/** A small dialog with one row per shortcut of the canvas. */
export function MeshShortcutsDialog({ isOpen, onClose }: { isOpen: boolean; onClose: () => void }) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="Keyboard shortcuts of the mesh" icon="key-command">
      <DialogBody>
        <HTMLTable compact className="hx-full-width">
          <thead>
            <tr>
              <th scope="col">Keys</th>
              <th scope="col">What they do</th>
            </tr>
          </thead>
          <tbody>
            {MESH_CANVAS_SHORTCUTS.map((s) => (
              <tr key={s.keys}>
                <td>
                  <kbd>{s.keys}</kbd>
                </td>
                <td>{s.action}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </DialogBody>
    </Dialog>
  );
}

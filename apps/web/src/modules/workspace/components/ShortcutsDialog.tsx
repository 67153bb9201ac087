// The list of keyboard shortcuts of the workspace and its canvas.
import { Dialog, DialogBody, HTMLTable } from '@blueprintjs/core';

type Shortcut = { keys: string; action: string };

/** A two-column table of keys and actions, grouped by where they apply. */
export function ShortcutsDialog({ isOpen, onClose, groups }: { isOpen: boolean; onClose: () => void; groups: { title: string; shortcuts: Shortcut[] }[] }) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="Keyboard shortcuts" icon="key-command">
      <DialogBody>
        {groups.map((g) => (
          <section key={g.title}>
            <h4>{g.title}</h4>
            <HTMLTable compact className="hx-full-width">
              <tbody>
                {g.shortcuts.map((s) => (
                  <tr key={s.keys}>
                    <td>
                      <kbd className="hx-mono">{s.keys}</kbd>
                    </td>
                    <td>{s.action}</td>
                  </tr>
                ))}
              </tbody>
            </HTMLTable>
          </section>
        ))}
      </DialogBody>
    </Dialog>
  );
}

// Save the draft as version N+1 with a note; a stale base shows the newer version instead of losing the edits.
import { AnchorButton, Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, TextArea } from '@blueprintjs/core';
import { useState } from 'react';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';

type Props = {
  isOpen: boolean;
  baseVersion: number;
  saving: boolean;
  error: Error | null;
  onClose: () => void;
  onSave: (note: string) => void;
  /** The newest version's number once the server named it (after a 409). */
  latestVersion: number;
};

/** The note is required in spirit (what changed and why) but may be empty; at most 2,000 characters. */
export function SaveVersionDialog({ isOpen, baseVersion, saving, error, onClose, onSave, latestVersion }: Props) {
  const [note, setNote] = useState('');
  const stale = error instanceof ApiRequestError && error.statusCode === 409;
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={`Save as version ${baseVersion + 1}`} icon="floppy-disk">
      <DialogBody>
        <FormGroup label="Note" labelFor="version-note" helperText={`${note.length} / 2000 · what changed and why, for the reviewers`}>
          <TextArea id="version-note" fill autoResize maxLength={2000} value={note} onChange={(e) => setNote(e.currentTarget.value)} data-testid="version-note" />
        </FormGroup>
        {stale ? (
          <Callout intent="warning" title="Someone saved a newer version" data-testid="stale-save">
            <p>{error.message}</p>
            <p>Your edits are still here. Look at v{latestVersion} in a new tab, then redo what you still need on top of it.</p>
            <AnchorButton intent="primary" icon="share" text={`Open v${latestVersion} in a new tab`} href={`?v=${latestVersion}`} target="_blank" rel="noopener" />
          </Callout>
        ) : (
          <ApiErrorCallout error={error} title="Could not save the version" />
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onClose} />
            <Button intent="primary" text="Save version" loading={saving} disabled={stale} onClick={() => onSave(note)} data-testid="confirm-save" />
          </>
        }
      />
    </Dialog>
  );
}

// The "New chip" button of the team home and its dialog.
import { Button } from '@blueprintjs/core';
import { useState } from 'react';
import { NewChipDialog } from './NewChipDialog.js';

/** A primary button that opens the new-chip dialog (shown to designers and owners). */
export function NewChipButton({ teamId, teamSlug }: { teamId: string; teamSlug: string }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button intent="primary" icon="add" text="New chip" onClick={() => setOpen(true)} />
      {open && <NewChipDialog teamId={teamId} teamSlug={teamSlug} isOpen onClose={() => setOpen(false)} />}
    </>
  );
}

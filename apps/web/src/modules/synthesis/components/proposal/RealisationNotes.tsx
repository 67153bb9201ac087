// What the synthesiser had to change from the request to fit whole unit lengths.
import { Callout } from '@blueprintjs/core';
import type { Proposal } from '@hexloom/contracts';
import { formatNoteValue } from '../../utils/formatNoteValue.js';

type Note = Proposal['notes'][number];

/** A warning callout listing each note: quantity, requested and achieved values, and the server's explanation. */
export function RealisationNotes({ notes }: { notes: readonly Note[] }) {
  if (notes.length === 0) return null;
  return (
    <Callout intent="warning" icon="info-sign" title="Changed from the request" data-testid="realisation-notes">
      <ul className="hx-synth-notes">
        {notes.map((note, k) => (
          <li key={k}>
            <strong>{`${note.quantity.charAt(0).toUpperCase()}${note.quantity.slice(1)}`}</strong>:{' '}
            {note.requested === null ? '' : `requested ${formatNoteValue(note.requested, note.unit)}, `}
            {note.requested === null ? 'now ' : 'achieved '}
            {formatNoteValue(note.achieved, note.unit)} — {note.note}
          </li>
        ))}
      </ul>
    </Callout>
  );
}

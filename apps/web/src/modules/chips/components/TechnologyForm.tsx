// The Technology tab: the chip's technology profile as a form, saved through the chip PATCH route.
import { Button, Callout } from '@blueprintjs/core';
import type { Chip } from '@hexloom/contracts';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useUpdateChip } from '../api/useUpdateChip.js';
import { parseTechnologyDraft, toTechnologyDraft, type TechnologyErrors } from '../utils/technologyDraft.js';
import { TechnologyFields } from './TechnologyFields.js';

export type TechnologyFormProps = { teamId: string; chip: Chip; canEdit: boolean };

/** Every figure of the profile with its unit; designers and owners save it (nothing is sent while a field is wrong). */
export function TechnologyForm({ teamId, chip, canEdit }: TechnologyFormProps) {
  const [draft, setDraft] = useState(() => toTechnologyDraft(chip.definition.technology));
  const [errors, setErrors] = useState<TechnologyErrors>({});
  const [savedRevision, setSavedRevision] = useState<number | null>(null);
  const update = useUpdateChip(teamId, chip.id);

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = parseTechnologyDraft(draft);
    if (!parsed.ok) {
      setErrors(parsed.errors);
      return;
    }
    setErrors({});
    update.mutate(
      { technology: parsed.technology },
      {
        onSuccess: (saved) => {
          setDraft(toTechnologyDraft(saved.definition.technology));
          setSavedRevision(saved.revision);
        },
      },
    );
  };

  const errorCount = Object.keys(errors).length;
  return (
    <form onSubmit={onSubmit} noValidate data-testid="technology-form" aria-label="Technology profile">
      {!canEdit && <p className="hx-muted">Your role can read the technology profile; designers and owners change it.</p>}
      <TechnologyFields
        draft={draft}
        errors={errors}
        readOnly={!canEdit}
        idPrefix="chip-tech"
        onChange={(key, value) => {
          setDraft((d) => ({ ...d, [key]: value }));
          setSavedRevision(null);
        }}
      />
      {errorCount > 0 && (
        <Callout intent="danger" role="alert">
          <p className="hx-callout-title">Nothing was saved</p>
          {errorCount === 1 ? 'One field needs' : `${errorCount} fields need`} a correction (see the messages under the fields).
        </Callout>
      )}
      <ApiErrorCallout error={update.error} title="Could not save the technology profile" />
      {savedRevision !== null && !update.isPending && (
        <Callout intent="success" role="status">
          <p className="hx-callout-title">Technology profile saved</p>
          The chip is now at revision {savedRevision}. Existing configuration versions keep the profile they were saved with.
        </Callout>
      )}
      {canEdit && (
        <div className="hx-form-actions">
          <Button type="submit" intent="primary" icon="floppy-disk" text="Save technology" loading={update.isPending} />
          <Button variant="minimal" text="Undo changes" onClick={() => {
              setDraft(toTechnologyDraft(chip.definition.technology));
              setErrors({});
            }} />
        </div>
      )}
    </form>
  );
}

// "New chip": from a template (rectangle or hexagon, technology from the demo profile) or from a chip JSON file.
import { Button, Dialog, DialogBody, DialogFooter, FileInput, FormGroup, Radio, RadioGroup } from '@blueprintjs/core';
import { DEMO_TECHNOLOGY } from '@hexloom/mesh';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { chipPath } from '../../../routes.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useCreateChip } from '../api/useCreateChip.js';
import { useImportChip } from '../api/useImportChip.js';
import { chipTemplateBody, DEFAULT_TEMPLATE, type TemplateErrors } from '../utils/chipTemplateDraft.js';
import { parseTechnologyDraft, toTechnologyDraft, type TechnologyErrors } from '../utils/technologyDraft.js';
import { NewChipTemplateForm } from './NewChipTemplateForm.js';

export type NewChipDialogProps = { teamId: string; teamSlug: string; isOpen: boolean; onClose: () => void };

/** Creates the chip (POST /chips or /chips/import) and opens its page; nothing is sent while a field is wrong. */
export function NewChipDialog({ teamId, teamSlug, isOpen, onClose }: NewChipDialogProps) {
  const navigate = useNavigate();
  const [source, setSource] = useState<'template' | 'file'>('template');
  const [template, setTemplate] = useState(DEFAULT_TEMPLATE);
  const [technology, setTechnology] = useState(() => toTechnologyDraft(DEMO_TECHNOLOGY));
  const [errors, setErrors] = useState<TemplateErrors>({});
  const [technologyErrors, setTechnologyErrors] = useState<TechnologyErrors>({});
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const create = useCreateChip(teamId);
  const upload = useImportChip(teamId);
  const opened = (chip: { id: string }) => {
    onClose();
    void navigate(chipPath(teamSlug, chip.id));
  };

  const onSubmit = (event: FormEvent) => {
    event.preventDefault();
    if (source === 'file') {
      if (!file) return setFileError('Choose a chip JSON file');
      if (!/\.json$/i.test(file.name)) return setFileError(`"${file.name}" is not a .json file`);
      setFileError(null);
      upload.mutate(file, { onSuccess: opened });
      return;
    }
    const tech = parseTechnologyDraft(technology);
    setTechnologyErrors(tech.ok ? {} : tech.errors);
    const body = chipTemplateBody(template, tech.ok ? tech.technology : DEMO_TECHNOLOGY);
    setErrors(body.ok ? {} : body.errors);
    if (tech.ok && body.ok) create.mutate(body.body, { onSuccess: opened });
  };

  const busy = create.isPending || upload.isPending;
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title="New chip" icon="add" style={{ width: 'min(720px, calc(100vw - 24px))' }}>
      <form onSubmit={onSubmit} noValidate aria-label="New chip">
        <DialogBody>
          <RadioGroup label="Start from" inline selectedValue={source} onChange={(e) => setSource(e.currentTarget.value === 'file' ? 'file' : 'template')}>
            <Radio value="template" label="A template" />
            <Radio value="file" label="A chip JSON file" />
          </RadioGroup>
          {source === 'template' ? (
            <NewChipTemplateForm draft={template} errors={errors} onChange={setTemplate} technology={technology} technologyErrors={technologyErrors} onTechnologyChange={setTechnology} />
          ) : (
            <FormGroup label="Chip JSON (mesh definition, schema version 1)" labelFor="new-chip-file" intent={fileError ? 'danger' : 'none'} helperText={fileError ?? 'As written by "hexloom mesh" or downloaded from another chip.'}>
              <FileInput
                fill
                text={file?.name ?? 'Choose a .json file…'}
                buttonText="Browse"
                inputProps={{ id: 'new-chip-file', accept: '.json,application/json' }}
                onInputChange={(e) => setFile(e.currentTarget.files?.[0] ?? null)}
              />
            </FormGroup>
          )}
          <ApiErrorCallout error={source === 'file' ? upload.error : create.error} title="The server did not create the chip" />
        </DialogBody>
        <DialogFooter
          actions={
            <>
              <Button text="Cancel" onClick={onClose} />
              <Button type="submit" intent="primary" text="Create chip" loading={busy} />
            </>
          }
        />
      </form>
    </Dialog>
  );
}

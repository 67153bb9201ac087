// The "from a template" side of the new-chip dialog: name, shape and size, I/O sites and a technology profile.
import { Collapse, FormGroup, HTMLSelect, InputGroup, Button } from '@blueprintjs/core';
import { useState } from 'react';
import type { TechnologyDraft, TechnologyErrors } from '../utils/technologyDraft.js';
import type { TemplateDraft, TemplateErrors } from '../utils/chipTemplateDraft.js';
import { TechnologyFields } from './TechnologyFields.js';

export type NewChipTemplateFormProps = {
  draft: TemplateDraft;
  errors: TemplateErrors;
  onChange: (draft: TemplateDraft) => void;
  technology: TechnologyDraft;
  technologyErrors: TechnologyErrors;
  onTechnologyChange: (draft: TechnologyDraft) => void;
};

/** Controlled fields of a template chip; the technology profile starts from the demo values and folds away. */
export function NewChipTemplateForm({ draft, errors, onChange, technology, technologyErrors, onTechnologyChange }: NewChipTemplateFormProps) {
  const [showTechnology, setShowTechnology] = useState(Object.keys(technologyErrors).length > 0);
  const set = (patch: Partial<TemplateDraft>) => onChange({ ...draft, ...patch });
  const field = (key: 'rows' | 'columns' | 'radius', label: string, max: number) => (
    <FormGroup label={label} labelFor={`new-chip-${key}`} intent={errors[key] ? 'danger' : 'none'} helperText={errors[key]}>
      <InputGroup id={`new-chip-${key}`} type="number" min={1} max={max} value={draft[key]} intent={errors[key] ? 'danger' : 'none'} onValueChange={(v) => set({ [key]: v })} />
    </FormGroup>
  );
  const technologyOpen = showTechnology || Object.keys(technologyErrors).length > 0;
  return (
    <div className="hx-stack" style={{ gap: 4 }}>
      <FormGroup label="Chip name" labelFor="new-chip-name" intent={errors.name ? 'danger' : 'none'} helperText={errors.name}>
        <InputGroup id="new-chip-name" value={draft.name} intent={errors.name ? 'danger' : 'none'} onValueChange={(v) => set({ name: v })} />
      </FormGroup>
      <div className="hx-row" style={{ alignItems: 'flex-start' }}>
        <FormGroup label="Shape" labelFor="new-chip-shape">
          <HTMLSelect id="new-chip-shape" value={draft.shape} onChange={(e) => set({ shape: e.currentTarget.value === 'hexagon' ? 'hexagon' : 'rectangle' })}>
            <option value="rectangle">Rectangle of cells</option>
            <option value="hexagon">Hexagon of cells</option>
          </HTMLSelect>
        </FormGroup>
        {draft.shape === 'rectangle' ? (
          <>
            {field('rows', 'Rows', 40)}
            {field('columns', 'Columns', 40)}
          </>
        ) : (
          field('radius', 'Radius (cells from the centre)', 300)
        )}
        <FormGroup label="I/O sites" labelFor="new-chip-io">
          <HTMLSelect id="new-chip-io" value={draft.io} onChange={(e) => set({ io: e.currentTarget.value === 'all' ? 'all' : 'left-right' })}>
            <option value="left-right">West and east sides</option>
            <option value="all">Every boundary site</option>
          </HTMLSelect>
        </FormGroup>
      </div>
      <Button variant="minimal" alignText="start" icon={technologyOpen ? 'chevron-down' : 'chevron-right'} text="Technology profile (starts from the demo values)" aria-expanded={technologyOpen} onClick={() => setShowTechnology(!technologyOpen)} />
      <Collapse isOpen={technologyOpen}>
        <TechnologyFields draft={technology} errors={technologyErrors} idPrefix="new-chip-tech" onChange={(key, value) => onTechnologyChange({ ...technology, [key]: value })} />
      </Collapse>
    </div>
  );
}

// The inputs of a technology profile, each labelled with its unit and its error underneath.
import { FormGroup, InputGroup } from '@blueprintjs/core';
import type { TechnologyDraft, TechnologyErrors } from '../utils/technologyDraft.js';
import { TECHNOLOGY_FIELDS, type TechnologyFieldKey } from '../utils/technologyFields.js';

export type TechnologyFieldsProps = {
  draft: TechnologyDraft;
  errors: TechnologyErrors;
  onChange: (key: TechnologyFieldKey, value: string) => void;
  readOnly?: boolean;
  /** Prefix of the input ids, so two forms can share a page. */
  idPrefix: string;
};

/** A responsive grid of labelled number fields ("Unit length (µm)"), read-only for roles that cannot edit. */
export function TechnologyFields({ draft, errors, onChange, readOnly = false, idPrefix }: TechnologyFieldsProps) {
  return (
    <div className="hx-tech-grid">
      {TECHNOLOGY_FIELDS.map((f) => {
        const id = `${idPrefix}-${f.key}`;
        const error = errors[f.key];
        return (
          <FormGroup
            key={f.key}
            label={f.label}
            labelFor={id}
            labelInfo={f.unit ? `(${f.unit})` : undefined}
            intent={error ? 'danger' : 'none'}
            helperText={error ?? f.help}
          >
            <InputGroup
              id={id}
              inputMode="decimal"
              value={draft[f.key]}
              readOnly={readOnly}
              intent={error ? 'danger' : 'none'}
              aria-invalid={error ? true : undefined}
              rightElement={f.unit ? <span className="hx-unit" aria-hidden="true">{f.unit}</span> : undefined}
              onValueChange={(value) => onChange(f.key, value)}
              placeholder={f.optional ? 'not set' : undefined}
            />
          </FormGroup>
        );
      })}
    </div>
  );
}

// The Dead gates tab: the gates the chip marks dead, edited by clicking gates on the canvas, then saved.
import { Button, Callout, Tag } from '@blueprintjs/core';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';

export type DeadGatesPanelProps = {
  /** The dead gates as edited (sorted). */
  deadGates: readonly string[];
  /** Whether they differ from the saved chip. */
  dirty: boolean;
  canEdit: boolean;
  onRemove: (gateId: string) => void;
  onReset: () => void;
  onSave: () => void;
  isSaving: boolean;
  error: Error | null;
};

/** The list of dead gates as removable tags, with Save and Undo for designers and owners. */
export function DeadGatesPanel({ deadGates, dirty, canEdit, onRemove, onReset, onSave, isSaving, error }: DeadGatesPanelProps) {
  return (
    <div className="hx-stack" data-testid="dead-gates-panel">
      <p className="hx-muted" style={{ margin: 0 }}>
        {canEdit
          ? 'Click a gate on the mesh (or focus it and press Enter) to mark it dead or working again, then save. Routing avoids dead gates.'
          : 'Dead gates are avoided by routing; designers and owners mark them.'}
      </p>
      {deadGates.length === 0 ? (
        <p>No gate is marked dead.</p>
      ) : (
        <ul className="hx-tag-list" aria-label="Dead gates">
          {deadGates.map((g) => (
            <li key={g}>
              <Tag minimal intent="danger" className="hx-mono">
                {g}
              </Tag>
              {canEdit && <Button size="small" variant="minimal" icon="cross" aria-label={`Mark ${g} working again`} title="Mark working again" onClick={() => onRemove(g)} />}
            </li>
          ))}
        </ul>
      )}
      {dirty && (
        <Callout intent="warning">
          <p className="hx-callout-title">Unsaved changes</p>
          {deadGates.length === 1 ? 'One gate is' : `${deadGates.length} gates are`} marked dead in this draft. Versions whose circuits use a newly dead gate will be listed for re-routing after saving.
        </Callout>
      )}
      <ApiErrorCallout error={error} title="Could not save the dead gates" />
      {canEdit && (
        <div className="hx-form-actions">
          <Button intent="primary" icon="floppy-disk" text="Save dead gates" disabled={!dirty} loading={isSaving} onClick={onSave} />
          <Button variant="minimal" icon="reset" text="Undo changes" disabled={!dirty} onClick={onReset} />
        </div>
      )}
    </div>
  );
}

// The body of the new-circuit drawer: circuit id, kind, the kind's form, the mask, then the server's answer.
import { Button, Classes, ProgressBar } from '@blueprintjs/core';
import type { FilterSpec, FilterSpecKind, Proposal } from '@hexloom/contracts';
import { useMemo, useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useSynthesise } from '../api/useSynthesise.js';
import { buildSynthesiseBody, type SynthesisFormState } from '../utils/buildSynthesiseBody.js';
import { initialFormState } from '../utils/initialFormState.js';
import { fieldError } from '../utils/fieldError.js';
import { freePortOptions } from '../utils/freePortOptions.js';
import type { ChipPort } from '../utils/portResolver.js';
import { outputRefs } from '../utils/outputRefs.js';
import { SPEC_KINDS } from '../utils/specKinds.js';
import { suggestCircuitId } from '../utils/suggestCircuitId.js';
import { validateSynthesiseBody } from '../utils/validateSynthesiseBody.js';
import { ChoiceField } from './fields/ChoiceField.js';
import { TextField } from './fields/TextField.js';
import { MaskTable } from './MaskTable.js';
import { ProposalView } from './proposal/ProposalView.js';
import { SpecForm } from './SpecForm.js';

export type NewCircuitPanelProps = {
  teamId: string;
  configurationId: string;
  versionNumber: number;
  ports: ChipPort[];
  existingCircuitIds: string[];
  onAccept: (proposal: Extract<Proposal, { ok: true }>, spec: FilterSpec) => void;
  onCancel: () => void;
};

const FIRST_KIND: FilterSpecKind = 'ring-notch';
const KIND_OPTIONS = SPEC_KINDS.map((k) => ({ value: k.kind, label: k.label }));

/** Holds one form per kind (switching kinds keeps what was typed); nothing is sent while the schema refuses the body. */
export function NewCircuitPanel({ teamId, configurationId, versionNumber, ports, existingCircuitIds, onAccept, onCancel }: NewCircuitPanelProps) {
  const [kind, setKind] = useState<FilterSpecKind>(FIRST_KIND);
  const [forms, setForms] = useState<Partial<Record<FilterSpecKind, SynthesisFormState>>>(() => ({ [FIRST_KIND]: initialFormState(FIRST_KIND, ports, existingCircuitIds) }));
  const [circuitId, setCircuitId] = useState(() => suggestCircuitId(FIRST_KIND, existingCircuitIds));
  const [idTouched, setIdTouched] = useState(false);
  const [attempted, setAttempted] = useState(false);
  const synthesise = useSynthesise({ teamId, configurationId, versionNumber });
  const options = useMemo(() => freePortOptions(ports), [ports]);

  const form = forms[kind] ?? initialFormState(kind, ports, existingCircuitIds);
  const setForm = (patch: Partial<SynthesisFormState>) => setForms((all) => ({ ...all, [kind]: { ...form, ...patch } }));
  const validation = useMemo(() => validateSynthesiseBody(buildSynthesiseBody({ ...form, circuitId }), existingCircuitIds), [form, circuitId, existingCircuitIds]);
  const errors = attempted && !validation.ok ? validation.errors : {};
  const outputs = outputRefs(form.values);
  const maskPorts = options.filter((p) => outputs.includes(p.ref));

  const chooseKind = (next: FilterSpecKind) => {
    setKind(next);
    if (!forms[next]) setForms((all) => ({ ...all, [next]: initialFormState(next, ports, existingCircuitIds) }));
    if (!idTouched) setCircuitId(suggestCircuitId(next, existingCircuitIds));
    synthesise.reset();
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setAttempted(true);
    if (validation.ok) synthesise.mutate(validation.body);
  };

  const sentSpec = synthesise.variables?.spec;
  const description = SPEC_KINDS.find((k) => k.kind === kind)?.description;
  return (
    <form onSubmit={submit} noValidate className="hx-synth-form" data-testid="new-circuit-form" aria-label="New circuit">
      <div className={`${Classes.DRAWER_BODY} hx-synth-body`}>
        <h3>Circuit</h3>
        <div className="hx-synth-grid">
          <TextField label="Circuit id" value={circuitId} onChange={(v) => { setCircuitId(v); setIdTouched(true); }} error={fieldError(errors, 'circuitId')} hint="a letter, then letters, digits, _ or -" testId="circuit-id" />
          <TextField label="Name of the request" value={form.name} onChange={(name) => setForm({ name })} error={fieldError(errors, 'spec.name')} />
          <ChoiceField label="Kind of circuit" value={kind} options={KIND_OPTIONS} onChange={chooseKind} testId="kind-select" />
        </div>
        {description && <p className="hx-muted hx-synth-kind-note">{description}</p>}
        {options.length === 0 && <p className="hx-muted">Every port of this chip is taken: free one before adding a circuit.</p>}
        <h3>Request</h3>
        <SpecForm values={form.values} onChange={(values) => setForm({ values })} ports={options} errors={errors} />
        <h3>Mask</h3>
        <MaskTable rows={form.mask} onChange={(mask) => setForm({ mask })} ports={maskPorts} errors={errors} />
        <div className="hx-stack" style={{ marginTop: 24 }} aria-live="polite">
          {attempted && !validation.ok && <p className="hx-synth-cell-error" role="alert">Some values need attention; nothing was sent.</p>}
          {synthesise.isPending && (
            <div className="hx-synth-progress" role="status" data-testid="synthesis-progress">
              <span>Synthesising, routing and verifying on the whole chip…</span>
              <ProgressBar intent="primary" />
            </div>
          )}
          <ApiErrorCallout error={synthesise.error} title="Could not synthesise" />
          {synthesise.data && sentSpec && <ProposalView proposal={synthesise.data} kind={sentSpec.spec.kind} onAccept={(proposal) => onAccept(proposal, sentSpec)} />}
        </div>
      </div>
      <div className={`${Classes.DRAWER_FOOTER} hx-synth-footer`}>
        <Button text="Cancel" variant="outlined" onClick={onCancel} />
        <Button type="submit" intent="primary" icon="predictive-analysis" text="Synthesise" loading={synthesise.isPending} data-testid="synthesise" />
      </div>
    </form>
  );
}

// Upload of a measured spectrum: read in the browser, previewed or its bad line named, then saved with ports and a label.
import { Button, Callout, FormGroup, HTMLSelect, InputGroup } from '@blueprintjs/core';
import type { ConfigurationVersion, Measurement } from '@hexloom/contracts';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useUploadMeasurement } from '../api/useUploadMeasurement.js';
import { previewMeasuredFile, type MeasuredFileCheck } from '../utils/previewMeasuredFile.js';
import { MeasuredDropZone } from './MeasuredDropZone.js';
import { MeasuredFilePreview } from './MeasuredFilePreview.js';

export type MeasurementUploadProps = {
  teamId: string;
  configurationId: string;
  version: ConfigurationVersion;
  /** Called with the stored measurement (e.g. to open its comparison). */
  onUploaded: (measurement: Measurement) => void;
};

type Checked = { file: File; check: MeasuredFileCheck };

/** Nothing is sent while the file has a problem or the two ports are the same. */
export function MeasurementUpload({ teamId, configurationId, version, onUploaded }: MeasurementUploadProps) {
  const mesh = version.content.mesh;
  const ports = mesh.ports.map((p) => ({ value: p.label ?? p.id, label: p.label ?? p.id }));
  const circuitPorts = version.content.circuits.find((c) => c.ports.length >= 2)?.ports ?? [];
  const byId = (id: string | undefined): string | undefined => (id === undefined ? undefined : (mesh.ports.find((p) => p.id === id)?.label ?? id));
  const [from, setFrom] = useState(byId(circuitPorts[0]) ?? ports[0]?.value ?? '');
  const [to, setTo] = useState(byId(circuitPorts[1]) ?? ports[1]?.value ?? '');
  const [label, setLabel] = useState('');
  const [checked, setChecked] = useState<Checked | null>(null);
  const upload = useUploadMeasurement(teamId, configurationId, version.number);

  const read = async (file: File) => {
    upload.reset();
    const text = (await file.text()).replace(/^\uFEFF/, '');
    setChecked({ file, check: previewMeasuredFile(text, file.name, file.size, mesh.technology.referenceFrequencyHz) });
  };
  const samePorts = from === to;
  const canSave = checked?.check.ok === true && !samePorts && from !== '' && label.length <= 200;
  const save = () => {
    if (!checked || !canSave) return;
    upload.mutate({ file: checked.file, from, to, label: label.trim() }, { onSuccess: (m) => { setChecked(null); setLabel(''); onUploaded(m); } });
  };

  if (ports.length < 2) {
    return <p className="hx-measured-note">The chip has fewer than two ports, so no connection can be measured.</p>;
  }
  return (
    <section className="hx-measured-section" aria-labelledby="hx-measured-upload">
      <h3 id="hx-measured-upload" className="hx-measured-heading">Add a measurement</h3>
      <MeasuredDropZone fileName={checked?.file.name} onFile={(f) => void read(f)} />
      {checked && !checked.check.ok && (
        <Callout intent="danger" role="alert" title={`${checked.file.name} cannot be read`} data-testid="measured-issues">
          <ul className="hx-measured-issues">
            {checked.check.issues.map((i) => (
              <li key={`${i.line ?? 'file'}:${i.reason}`}>{i.line === null ? `The file: ${i.reason}` : `Line ${i.line}: ${i.reason}`}</li>
            ))}
          </ul>
          Correct the file and drop it again; nothing is sent while it has a problem.
        </Callout>
      )}
      {checked?.check.ok && (
        <>
          <MeasuredFilePreview fileName={checked.file.name} preview={checked.check.preview} referenceFrequencyHz={mesh.technology.referenceFrequencyHz} />
          <div className="hx-measured-fields">
            <FormGroup label="From port" labelFor="hx-measured-from" helperText="Where the light enters (port 1 of a Touchstone file)">
              <HTMLSelect id="hx-measured-from" value={from} options={ports} onChange={(e) => setFrom(e.currentTarget.value)} />
            </FormGroup>
            <FormGroup label="To port" labelFor="hx-measured-to" helperText="Where it is detected (port 2)">
              <HTMLSelect id="hx-measured-to" value={to} options={ports} onChange={(e) => setTo(e.currentTarget.value)} />
            </FormGroup>
            <FormGroup label="Label" labelFor="hx-measured-label" labelInfo="(optional)">
              <InputGroup id="hx-measured-label" value={label} maxLength={200} placeholder="e.g. Bench sweep after anneal" onValueChange={setLabel} />
            </FormGroup>
          </div>
          {samePorts && <p className="hx-measured-problem" role="status">Choose two different ports.</p>}
          <Button intent="primary" icon="floppy-disk" text="Save measurement" disabled={!canSave} loading={upload.isPending} onClick={save} />
        </>
      )}
      {upload.isSuccess && (
        <Callout intent="success" role="status">
          Saved {upload.data.fileName}: {upload.data.points} points from {byId(upload.data.from)} to {byId(upload.data.to)}.
        </Callout>
      )}
      <ApiErrorCallout error={upload.error} title="The server refused the measurement" />
    </section>
  );
}

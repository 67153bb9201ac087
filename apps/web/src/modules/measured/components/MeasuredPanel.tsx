// The Measured tab of a version: its measured spectra, an upload with a preview, and the comparison with the simulation.
import { Spinner } from '@blueprintjs/core';
import type { ConfigurationVersion } from '@hexloom/contracts';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useMeasurements } from '../api/useMeasurements.js';
import '../measured.css';
import { ComparisonView } from './ComparisonView.js';
import { MeasurementsTable } from './MeasurementsTable.js';
import { MeasurementUpload } from './MeasurementUpload.js';

/** The version whose measurements to show; `canUpload` for owners, designers and reviewers (the route's roles). */
export type MeasuredPanelProps = { teamId: string; configurationId: string; version: ConfigurationVersion; canUpload: boolean };

/** Viewers see the list and the comparisons; the upload is shown only with `canUpload`. */
export function MeasuredPanel({ teamId, configurationId, version, canUpload }: MeasuredPanelProps) {
  const list = useMeasurements(teamId, configurationId, version.number);
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const definition = version.content.mesh;
  const measurements = list.data ?? [];
  const selected = measurements.find((m) => m.id === selectedId) ?? null;
  return (
    <div className="hx-measured" role="region" aria-label={`Measurements of version ${version.number}`}>
      <section className="hx-measured-section" aria-labelledby="hx-measured-list">
        <h3 id="hx-measured-list" className="hx-measured-heading">Measured spectra</h3>
        {list.isPending && (
          <span className="hx-measured-inline">
            <Spinner size={16} aria-label="Loading the measurements" /> Loading the measurements…
          </span>
        )}
        <ApiErrorCallout error={list.error} title="Could not load the measurements" onRetry={() => void list.refetch()} />
        {list.data && measurements.length === 0 && (
          <p className="hx-measured-note">No measurement is attached to version {version.number} yet.{canUpload ? ' Add one below.' : ''}</p>
        )}
        {measurements.length > 0 && <MeasurementsTable measurements={measurements} definition={definition} selectedId={selectedId} onCompare={setSelectedId} />}
      </section>
      {selected && <ComparisonView key={selected.id} teamId={teamId} configurationId={configurationId} versionNumber={version.number} measurement={selected} definition={definition} />}
      {canUpload && <MeasurementUpload teamId={teamId} configurationId={configurationId} version={version} onUploaded={(m) => setSelectedId(m.id)} />}
    </div>
  );
}

// Downloads of a version's bench export (JSON, CSV) and of its simulated S-parameters (Touchstone).
import { Button, ButtonGroup } from '@blueprintjs/core';
import type { ConfigurationVersion } from '@hexloom/contracts';
import { loopFsrHz } from '@hexloom/solver';
import { useState } from 'react';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { downloadBlob } from '../../response/utils/downloadBlob.js';
import { benchPaths, type TouchstoneRequest } from '../api/benchPaths.js';
import type { LoadedBenchExport } from '../api/useBenchExport.js';
import { useExportDownload } from '../api/useExportDownload.js';
import { exportFileBase } from '../utils/exportFileBase.js';
import { TouchstoneForm, type TouchstonePort } from './TouchstoneForm.js';

export type BenchDownloadsProps = {
  teamId: string;
  configurationId: string;
  version: ConfigurationVersion;
  /** The loaded export, or undefined while loading or when it was refused. */
  loaded: LoadedBenchExport | undefined;
  /** The cautions have been acknowledged: only then do the buttons enable. */
  acknowledged: boolean;
};

/** Half the unit FSR of the chip, Hz (the default Touchstone span), or 50 GHz when the technology is unusable. */
function halfUnitFsrHz(technology: ConfigurationVersion['content']['mesh']['technology']): number {
  try {
    return loopFsrHz({ unitLengthUm: technology.unitLengthUm, groupIndex: technology.groupIndex, lengthUnits: 1 }) / 2;
  } catch {
    return 50e9;
  }
}

/** JSON and CSV buttons, and the Touchstone form; errors of a download are shown in words below. */
export function BenchDownloads({ teamId, configurationId, version, loaded, acknowledged }: BenchDownloadsProps) {
  const download = useExportDownload();
  const [savedJson, setSavedJson] = useState<string | null>(null);
  const n = version.number;
  const base = loaded ? exportFileBase(loaded.exported.configuration, n) : `configuration-v${n}`;
  const ports: TouchstonePort[] = version.content.mesh.ports.map((p) => ({ id: p.id, label: p.label ?? p.id }));
  const circuitPorts = version.content.circuits.find((c) => c.ports.length >= 2)?.ports ?? [];
  const initialFrom = circuitPorts[0] ?? ports[0]?.id ?? '';
  const initialTo = circuitPorts[1] ?? ports[1]?.id ?? '';
  const ready = acknowledged && loaded !== undefined;

  const saveJson = () => {
    if (!loaded) return;
    const name = loaded.fileName ?? `${base}.bench.json`;
    download.reset();
    downloadBlob(new Blob([loaded.text], { type: 'application/json' }), name);
    setSavedJson(name);
  };
  const saveCsv = () => (setSavedJson(null), download.mutate({ path: benchPaths.benchExport(teamId, configurationId, n, 'csv'), mediaType: 'text/csv', fallbackName: `${base}.bench.csv` }));
  const saveTouchstone = (q: TouchstoneRequest) => (setSavedJson(null), download.mutate({ path: benchPaths.touchstone(teamId, configurationId, n, q), mediaType: 'text/plain', fallbackName: `${base}.s2p` }));

  return (
    <section className="hx-bench-section" aria-labelledby="hx-bench-downloads">
      <h3 id="hx-bench-downloads" className="hx-bench-heading">Downloads</h3>
      {!acknowledged && <p className="hx-bench-note">Tick the box under the cautions to enable the downloads.</p>}
      <ButtonGroup className="hx-bench-buttons">
        <Button icon="download" text="Download JSON" aria-label={`Download JSON: the bench export as ${base}.bench.json`} disabled={!ready} onClick={saveJson} />
        <Button icon="th" text="Download CSV" aria-label={`Download CSV: the bench export as ${base}.bench.csv`} disabled={!ready} loading={download.isPending && download.variables.mediaType === 'text/csv'} onClick={saveCsv} />
      </ButtonGroup>
      <h4 className="hx-bench-subheading">Simulated S-parameters</h4>
      {ports.length >= 2 ? (
        <TouchstoneForm
          ports={ports}
          initialFrom={initialFrom}
          initialTo={initialTo}
          halfSpanHz={halfUnitFsrHz(version.content.mesh.technology)}
          disabled={!acknowledged}
          pending={download.isPending && download.variables.mediaType === 'text/plain'}
          onSubmit={saveTouchstone}
        />
      ) : (
        <p className="hx-bench-note">The chip has fewer than two ports, so there is no S-parameter file to export.</p>
      )}
      {(savedJson ?? (download.isSuccess ? download.data : null)) && (
        <p className="hx-bench-note" role="status">
          Saved {savedJson ?? download.data}.
        </p>
      )}
      <ApiErrorCallout error={download.error} title="Could not download the file" />
    </section>
  );
}

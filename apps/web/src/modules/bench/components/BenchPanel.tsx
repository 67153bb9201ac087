// The Bench tab of a version: cautions first, then downloads, checksum, drive values and gate states.
import { BENCH_CAUTIONS } from '@hexloom/bench';
import { Callout, Spinner } from '@blueprintjs/core';
import type { ConfigurationVersion } from '@hexloom/contracts';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { chipPath } from '../../../routes.js';
import { useChip } from '../../chips/api/useChip.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { useCurrentTeam } from '../../teams/hooks/useCurrentTeam.js';
import { DriveLimitRequestError } from '../api/DriveLimitRequestError.js';
import { useBenchExport } from '../api/useBenchExport.js';
import { useChecksumCheck } from '../hooks/useChecksumCheck.js';
import '../bench.css';
import { BenchCautions } from './BenchCautions.js';
import { BenchDownloads } from './BenchDownloads.js';
import { ChecksumLine } from './ChecksumLine.js';
import { DriveLimitList } from './DriveLimitList.js';
import { DriveTable } from './DriveTable.js';
import { GateStatesTable } from './GateStatesTable.js';

/** The version to export and the chip it runs on. */
export type BenchPanelProps = { teamId: string; configurationId: string; version: ConfigurationVersion; chipId: string };

/**
 * Loads the version's bench export (any member may export; nothing here writes). A drive value beyond its limit
 * shows the server's list of shifters in words instead of the tables.
 */
export function BenchPanel({ teamId, configurationId, version, chipId }: BenchPanelProps) {
  const [acknowledged, setAcknowledged] = useState(false);
  const bench = useBenchExport(teamId, configurationId, version.number);
  const chip = useChip(teamId, chipId);
  const { teamSlug } = useCurrentTeam();
  const loaded = bench.data;
  const check = useChecksumCheck(loaded?.raw);
  const limits = bench.error instanceof DriveLimitRequestError ? bench.error : null;
  const cautions = loaded?.exported.cautions ?? (limits && limits.cautions.length > 0 ? limits.cautions : BENCH_CAUTIONS);
  const usesProfile = loaded?.exported.drives.some((d) => d.source === 'profile') ?? false;

  return (
    <div className="hx-bench" aria-label={`Bench export of version ${version.number}`} role="region">
      <BenchCautions cautions={cautions} acknowledged={acknowledged} onAcknowledgedChange={setAcknowledged} />
      {version.deadGatesInUse.length > 0 && (
        <Callout intent="danger" icon="error" title="This version uses gates the chip now marks dead">
          Re-route before taking it to the bench: {version.deadGatesInUse.join(', ')}.
        </Callout>
      )}
      <BenchDownloads teamId={teamId} configurationId={configurationId} version={version} loaded={loaded} acknowledged={acknowledged} />
      {bench.isPending && (
        <div className="hx-bench-inline">
          <Spinner size={16} aria-label="Loading the bench export" /> Computing the drive values…
        </div>
      )}
      {limits && <DriveLimitList violations={limits.violations} />}
      {bench.error && !limits && <ApiErrorCallout error={bench.error} title="Could not load the bench export" onRetry={() => void bench.refetch()} />}
      {loaded && (
        <>
          <section className="hx-bench-section" aria-labelledby="hx-bench-format">
            <h3 id="hx-bench-format" className="hx-bench-heading">Export of {loaded.exported.chip}, {loaded.exported.configuration}, version {loaded.exported.version}</h3>
            <ChecksumLine exported={loaded.exported} check={check} />
          </section>
          <section className="hx-bench-section" aria-labelledby="hx-bench-drives">
            <h3 id="hx-bench-drives" className="hx-bench-heading">Drive values</h3>
            {usesProfile && (
              <p className="hx-bench-note">
                Rows marked “technology profile” have no calibration row and use the chip&apos;s nominal heater figures
                {chip.data && !chip.data.hasCalibration ? ' (this chip has no calibration yet)' : ''}.{' '}
                {teamSlug && <Link to={chipPath(teamSlug, chipId)}>Open the chip to upload a calibration</Link>}
              </p>
            )}
            <DriveTable drives={loaded.exported.drives} reportedTotalW={loaded.exported.totalPowerW} />
          </section>
          <section className="hx-bench-section" aria-labelledby="hx-bench-gates">
            <h3 id="hx-bench-gates" className="hx-bench-heading">Gate states</h3>
            <GateStatesTable gates={loaded.exported.gates} parkedState={loaded.exported.parkedState} />
          </section>
        </>
      )}
    </div>
  );
}

// What changed from version A to version B: circuits, gates on the mesh, figures and the two responses overlaid.
import { Spinner } from '@blueprintjs/core';
import { Link } from 'react-router-dom';
import { useConfigurationVersion } from '../../chips/api/useConfigurationVersion.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { MeshCanvas } from '../../mesh-canvas/components/MeshCanvas.js';
import { useVersionDiff } from '../api/useVersionDiff.js';
import { configurationVersionPath } from '../utils/configurationVersionPath.js';
import { ChangedGatesTable } from './ChangedGatesTable.js';
import { DiffResponse } from './DiffResponse.js';
import { DiffSummary } from './DiffSummary.js';
import { FigureComparisonTable } from './FigureComparisonTable.js';

/** Props of {@link VersionDiffView}: version numbers `from` (A) and `to` (B) of one configuration. */
export type VersionDiffViewProps = { teamId: string; teamSlug: string; configurationId: string; from: number; to: number };

/** Loads the server's diff and both versions' content; each failure is shown in words with "Try again". */
export function VersionDiffView({ teamId, teamSlug, configurationId, from, to }: VersionDiffViewProps) {
  const diff = useVersionDiff(teamId, configurationId, from, to);
  const a = useConfigurationVersion(teamId, configurationId, from);
  const b = useConfigurationVersion(teamId, configurationId, to);
  const failed = diff.error ?? a.error ?? b.error;
  if (failed) {
    const retry = () => void [diff, a, b].filter((q) => q.error).forEach((q) => q.refetch());
    return <ApiErrorCallout error={failed} title={`Could not compare v${from} with v${to}`} onRetry={retry} />;
  }
  if (!diff.data || !a.data || !b.data) return <Spinner size={30} aria-label={`Comparing v${from} with v${to}`} />;
  const changed = diff.data.gatesChanged.map((g) => g.gate);
  const mesh = b.data.content.mesh;
  return (
    <div className="hx-stack" data-testid="version-diff">
      <p className="hx-muted">
        From <Link to={configurationVersionPath(teamSlug, configurationId, from)}>v{from}</Link> (A) to{' '}
        <Link to={configurationVersionPath(teamSlug, configurationId, to)}>v{to}</Link> (B).
      </p>
      <DiffSummary diff={diff.data} />
      <div className="hx-diff-mesh">
        <MeshCanvas definition={mesh} configuration={b.data.content} highlightGateIds={changed} highlightLabel={`Changed since v${from}`} height={380} ariaLabel={`Mesh of v${to} with the gates changed since v${from} marked`} />
        <ChangedGatesTable changes={diff.data.gatesChanged} from={from} to={to} parkedA={a.data.content.parkedState} parkedB={b.data.content.parkedState} />
      </div>
      <FigureComparisonTable a={a.data} b={b.data} />
      <DiffResponse a={a.data} b={b.data} preferredCircuits={diff.data.circuitsChanged} />
    </div>
  );
}

// /t/:teamSlug/configurations/:configurationId?v=N: the configuration workspace on version N (the newest by default).
import { useSearchParams, useParams } from 'react-router-dom';
import { ApiErrorCallout } from '../modules/core/components/ApiErrorCallout.js';
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { useDocumentTitle } from '../modules/core/hooks/useDocumentTitle.js';
import { useConfiguration } from '../modules/chips/api/useConfiguration.js';
import { useCalibration } from '../modules/chips/api/useCalibration.js';
import { useConfigurationVersion } from '../modules/chips/api/useConfigurationVersion.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';
import { ConfigurationWorkspace } from '../modules/workspace/components/ConfigurationWorkspace.js';
import { WorkspaceSkeleton } from '../modules/workspace/components/WorkspaceSkeleton.js';

/** Loads the team, the configuration and the version in the URL, then hands over to the workspace. */
export function ConfigurationPage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  const { configurationId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const configuration = useConfiguration(team?.id ?? '', configurationId);
  const asked = Number(search.get('v'));
  const number = Number.isInteger(asked) && asked > 0 ? asked : configuration.data?.headVersion;
  const version = useConfigurationVersion(team?.id ?? '', configurationId, team ? number : undefined);
  const calibration = useCalibration(team?.id ?? '', configuration.data?.chipId ?? '');
  useDocumentTitle(configuration.data ? `${configuration.data.name} v${number ?? ''}` : 'Configuration');
  if (isLoading || (team && configuration.isPending)) return <WorkspaceSkeleton />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  if (configuration.error || !configuration.data) return <ApiErrorCallout error={configuration.error} title="Could not load the configuration" onRetry={() => void configuration.refetch()} />;
  if (version.error) return <ApiErrorCallout error={version.error} title={`Could not load version ${number}`} onRetry={() => void version.refetch()} />;
  if (!version.data) return <WorkspaceSkeleton />;
  return <ConfigurationWorkspace key={version.data.id} team={team} detail={configuration.data} version={version.data} calibration={calibration.data?.shifters} onOpenVersion={(n) => setSearch({ v: String(n) })} />;
}

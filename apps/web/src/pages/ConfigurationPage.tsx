// /t/:teamSlug/configurations/:configurationId: versions with their review status, and the simulated response.
import { HTMLTable } from '@blueprintjs/core';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { teamHomePath } from '../routes.js';
import { ApiErrorCallout } from '../modules/core/components/ApiErrorCallout.js';
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { useConfiguration } from '../modules/chips/api/useConfiguration.js';
import { useConfigurationVersion } from '../modules/chips/api/useConfigurationVersion.js';
import { CircuitResponse } from '../modules/chips/components/CircuitResponse.js';
import { StatusTag } from '../modules/chips/components/StatusTag.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';
import { formatDate } from '../modules/teams/utils/formatDate.js';

/** One configuration: pick a version, read its status, circuits and figures, and see the chip's response. */
export function ConfigurationPage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  const { configurationId = '' } = useParams();
  const configuration = useConfiguration(team?.id ?? '', configurationId);
  const [picked, setPicked] = useState<number | undefined>(undefined);
  const number = picked ?? configuration.data?.headVersion;
  const version = useConfigurationVersion(team?.id ?? '', configurationId, team ? number : undefined);
  if (isLoading || (team && configuration.isPending)) return <PageSpinner />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  if (configuration.error || !configuration.data) return <ApiErrorCallout error={configuration.error} title="Could not load the configuration" />;
  const c = configuration.data;
  return (
    <div data-testid="configuration-page" className="hx-stack">
      <header className="hx-page-header">
        <h1>{c.name}</h1>
        <span className="hx-muted">
          <Link to={teamHomePath(teamSlug)}>{team.name}</Link> · v{number} <StatusTag status={c.versions.find((v) => v.number === number)?.status ?? c.headStatus} />
        </span>
      </header>
      <HTMLTable compact interactive className="hx-full-width" data-testid="versions-table">
        <thead>
          <tr>
            <th>Version</th>
            <th>Status</th>
            <th>Author</th>
            <th>Saved</th>
            <th>Approved by</th>
            <th>Note</th>
          </tr>
        </thead>
        <tbody>
          {[...c.versions].reverse().map((v) => (
            <tr key={v.number} onClick={() => setPicked(v.number)} className={v.number === number ? 'hx-selected' : undefined} data-testid={`version-${v.number}`}>
              <td className="hx-mono">v{v.number}</td>
              <td>
                <StatusTag status={v.status} />
              </td>
              <td className="hx-mono">{v.author}</td>
              <td className="hx-mono">{formatDate(v.createdAt)}</td>
              <td className="hx-mono">{v.approvedBy ?? ''}</td>
              <td>{v.note}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <ApiErrorCallout error={version.error} title="Could not load the version" />
      {version.data && <CircuitResponse key={version.data.id} teamId={team.id} version={version.data} />}
    </div>
  );
}

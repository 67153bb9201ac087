// The configuration versions whose circuits use a gate the chip now marks dead.
import { Callout } from '@blueprintjs/core';
import type { Chip } from '@hexloom/contracts';
import { Link } from 'react-router-dom';
import { configurationPath } from '../../../routes.js';

/** A warning listing each affected version with its dead gates and a link to re-route it; nothing when none. */
export function AffectedVersionsCallout({ chip, teamSlug }: { chip: Chip; teamSlug: string }) {
  if (chip.affectedVersions.length === 0) return null;
  return (
    <Callout intent="warning" icon="warning-sign" data-testid="affected-versions">
      <p className="hx-callout-title">Circuits that use a dead gate</p>
      <ul className="hx-issue-list">
        {chip.affectedVersions.map((v) => (
          <li key={`${v.configurationId}/${v.number}`}>
            <Link to={configurationPath(teamSlug, v.configurationId)}>{v.configurationName}</Link> version {v.number} uses{' '}
            <span className="hx-mono">{v.deadGates.join(', ')}</span>: re-route its circuits.
          </li>
        ))}
      </ul>
    </Callout>
  );
}

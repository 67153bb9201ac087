// The Versions tab: the history of a configuration and the diff between any two of its versions.
import { Callout } from '@blueprintjs/core';
import type { ConfigurationDetail } from '@hexloom/contracts';
import { useState } from 'react';
import { defaultComparison } from '../utils/defaultComparison.js';
import { VersionDiffView } from './VersionDiffView.js';
import { VersionHistoryTable } from './VersionHistoryTable.js';
import { VersionPicker } from './VersionPicker.js';
import '../versions.css';

/** Props of {@link VersionsPanel}. */
export type VersionsPanelProps = { teamId: string; teamSlug: string; detail: ConfigurationDetail; current: number; onOpen: (n: number) => void };

/**
 * History newest first (status, author, date and time, approver, note; Enter opens a row), then two version pickers
 * (A defaults to the version before `current`, B to `current`) and their diff: circuits, changed gates on the mesh,
 * figures side by side and both responses overlaid. Reading only: every member may use all of it.
 */
export function VersionsPanel({ teamId, teamSlug, detail, current, onOpen }: VersionsPanelProps) {
  const [picked, setPicked] = useState<{ a: number; b: number } | undefined>(undefined);
  const { a, b } = picked ?? defaultComparison(detail.versions, current);
  return (
    <div className="hx-stack" data-testid="versions-panel">
      <VersionHistoryTable versions={detail.versions} current={current} compared={{ a, b }} onOpen={onOpen} />
      <section className="hx-stack" aria-labelledby="version-diff-heading">
        <h2 id="version-diff-heading" className="hx-section-title">
          Compare two versions
        </h2>
        {detail.versions.length < 2 ? (
          <Callout intent="primary">This configuration has one version so far: save another to compare them.</Callout>
        ) : (
          <>
            <VersionPicker versions={detail.versions} a={a} b={b} onChange={setPicked} />
            {a === undefined || b === undefined || a === b ? (
              <Callout intent="primary">Pick two different versions to see what changed between them.</Callout>
            ) : (
              <VersionDiffView teamId={teamId} teamSlug={teamSlug} configurationId={detail.id} from={a} to={b} />
            )}
          </>
        )}
      </section>
    </div>
  );
}

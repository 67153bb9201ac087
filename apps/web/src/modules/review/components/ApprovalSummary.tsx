// The review status of the version shown, bound to its number, and a warning when a newer version is not approved.
import { Callout } from '@blueprintjs/core';
import type { VersionSummary } from '@hexloom/contracts';
import { StatusTag } from '../../chips/components/StatusTag.js';
import { approvalLine, versionStatusWords, type NameOf } from '../utils/approvalLine.js';

export type ApprovalSummaryProps = {
  /** The version shown, with its status as the server last answered it. */
  version: Pick<VersionSummary, 'number' | 'status' | 'approvedBy' | 'approvedAt'>;
  /** Every version of the configuration (to spot a newer one). */
  versions: readonly Pick<VersionSummary, 'number' | 'status'>[];
  nameOf: NameOf;
};

/** "Approved v3 by Caspar Iyengar, 03 Dec 2026, 17:04 UTC" with the status tag; a callout for a newer unapproved version. */
export function ApprovalSummary({ version, versions, nameOf }: ApprovalSummaryProps) {
  const newest = [...versions].sort((a, b) => b.number - a.number)[0];
  const newerUnapproved = newest && newest.number > version.number && newest.status !== 'approved' ? newest : undefined;
  return (
    <div className="hx-review-status">
      <p className="hx-review-approval" data-testid="approval-line">
        <StatusTag status={version.status} /> <span>{approvalLine(version, nameOf)}</span>
      </p>
      {newerUnapproved ? (
        <Callout intent="warning" icon="warning-sign" title={`Version ${newerUnapproved.number} is not approved`} data-testid="newer-version-callout">
          Version {newerUnapproved.number} was saved after v{version.number} and is {versionStatusWords(newerUnapproved.status)}. An approval
          holds only for the version it was given on.
        </Callout>
      ) : null}
    </div>
  );
}

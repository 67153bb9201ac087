// The approval of one version in words, bound to that version's number.
import type { VersionSummary } from '@hexloom/contracts';
import { formatDate } from '../../teams/utils/formatDate.js';

/** How a person is shown: their name when the team list knows them, else their login. */
export type NameOf = (login: string) => string;

const STATUS_WORDS: Record<VersionSummary['status'], string> = {
  draft: 'a draft, not approved',
  in_review: 'in review, not approved yet',
  approved: 'approved',
  changes_requested: 'changes requested, not approved',
};

/** A version's status in words: "approved", "a draft, not approved"... */
export function versionStatusWords(status: VersionSummary['status']): string {
  return STATUS_WORDS[status];
}

/** "Approved v3 by Caspar Iyengar, 03 Dec 2026, 17:04 UTC", or "v4 is a draft, not approved". */
export function approvalLine(version: Pick<VersionSummary, 'number' | 'status' | 'approvedBy' | 'approvedAt'>, nameOf: NameOf): string {
  if (version.status === 'approved' && version.approvedBy) {
    return `Approved v${version.number} by ${nameOf(version.approvedBy)}${version.approvedAt ? `, ${formatDate(version.approvedAt)}` : ''}`;
  }
  return `v${version.number} is ${STATUS_WORDS[version.status]}`;
}

// Which team roles may write on the review routes (the server's @TeamRoles of apps/server/src/reviews).
import type { TeamRole } from '@hexloom/contracts';

/** Owners and designers name reviewers (POST .../reviews). */
export function canRequestReview(role: TeamRole | undefined): boolean {
  return role === 'owner' || role === 'designer';
}

/** Owners, designers and reviewers comment, resolve threads and, when named, decide (viewers only read). */
export function canDiscuss(role: TeamRole | undefined): boolean {
  return role === 'owner' || role === 'designer' || role === 'reviewer';
}

/** Members who may be named as reviewers of a version: anyone but viewers and the version's author. */
export function reviewerCandidates<M extends { login: string; role: string }>(members: readonly M[], author: string): M[] {
  return members.filter((m) => m.role !== 'viewer' && m.login !== author);
}

// Whether a team role may change chips (create, edit, calibrate).
import type { TeamRole } from '@hexloom/contracts';

/** Designers and owners edit chips; reviewers and viewers read them (docs/api.md, chip routes). */
export function canEditChips(role: TeamRole | undefined): boolean {
  return role === 'owner' || role === 'designer';
}

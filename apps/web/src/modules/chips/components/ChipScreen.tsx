// Loads one chip of the team and shows it, or says why it cannot.
import type { TeamRole } from '@hexloom/contracts';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { NotFoundState } from '../../core/components/NotFoundState.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useDocumentTitle } from '../../core/hooks/useDocumentTitle.js';
import { useChip } from '../api/useChip.js';
import { canEditChips } from '../utils/canEditChips.js';
import { ChipDetail } from './ChipDetail.js';

export type ChipScreenProps = { teamId: string; teamSlug: string; chipId: string; role: TeamRole };

/** Spinner, "chip not found" for a 404, the server's message for other errors, else the chip. */
export function ChipScreen({ teamId, teamSlug, chipId, role }: ChipScreenProps) {
  const chip = useChip(teamId, chipId);
  useDocumentTitle(chip.data?.name ?? 'Chip');
  if (chip.isPending) return <PageSpinner label="Loading the chip" />;
  if (chip.error) {
    if (chip.error instanceof ApiRequestError && (chip.error.statusCode === 404 || chip.error.statusCode === 400))
      return <NotFoundState title="Chip not found" description="This team has no chip at this address." />;
    return <ApiErrorCallout error={chip.error} title="Could not load the chip" />;
  }
  return <ChipDetail teamId={teamId} teamSlug={teamSlug} chip={chip.data} canEdit={canEditChips(role)} />;
}

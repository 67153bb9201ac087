// The team's chips (or the empty state that says what to do first), with "New chip" for designers and owners.
import { Spinner } from '@blueprintjs/core';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { TeamHomeEmptyState } from '../../teams/components/TeamHomeEmptyState.js';
import { useCurrentTeam } from '../../teams/hooks/useCurrentTeam.js';
import { useChips } from '../api/useChips.js';
import { canEditChips } from '../utils/canEditChips.js';
import { ChipCard } from './ChipCard.js';
import { NewChipButton } from './NewChipButton.js';
import './chips.css';

/** A "Chips" section: the New chip button when the role may create chips, then one card per chip. */
export function ChipsOverview({ teamId, teamSlug }: { teamId: string; teamSlug: string }) {
  const chips = useChips(teamId);
  const { team } = useCurrentTeam();
  const canCreate = canEditChips(team?.role);
  return (
    <section className="hx-stack" data-testid="chips-overview" aria-labelledby="chips-heading">
      <div className="hx-row" style={{ justifyContent: 'space-between' }}>
        <h2 id="chips-heading" className="hx-section-title">
          Chips
        </h2>
        {canCreate && <NewChipButton teamId={teamId} teamSlug={teamSlug} />}
      </div>
      {chips.isPending && <Spinner size={30} aria-label="Loading the chips" />}
      <ApiErrorCallout error={chips.error} title="Could not load the chips" />
      {chips.data?.length === 0 && <TeamHomeEmptyState />}
      {chips.data?.map((chip) => (
        <ChipCard key={chip.id} chip={chip} teamId={teamId} teamSlug={teamSlug} />
      ))}
    </section>
  );
}

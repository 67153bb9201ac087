// The team's chips, or the empty state that says what to do first.
import { Spinner } from '@blueprintjs/core';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { TeamHomeEmptyState } from '../../teams/components/TeamHomeEmptyState.js';
import { useChips } from '../api/useChips.js';
import { ChipCard } from './ChipCard.js';

export function ChipsOverview({ teamId, teamSlug }: { teamId: string; teamSlug: string }) {
  const chips = useChips(teamId);
  if (chips.isPending) return <Spinner size={30} />;
  if (chips.error) return <ApiErrorCallout error={chips.error} title="Could not load the chips" />;
  if (chips.data.length === 0) return <TeamHomeEmptyState />;
  return (
    <section className="hx-stack" data-testid="chips-overview">
      {chips.data.map((chip) => (
        <ChipCard key={chip.id} chip={chip} teamId={teamId} teamSlug={teamSlug} />
      ))}
    </section>
  );
}

// /t/:teamSlug/chips/:chipId: one chip's mesh, technology profile, calibration and dead gates.
import { useParams } from 'react-router-dom';
import { ChipScreen } from '../modules/chips/components/ChipScreen.js';
import { NotFoundState } from '../modules/core/components/NotFoundState.js';
import { PageSpinner } from '../modules/core/components/PageSpinner.js';
import { useCurrentTeam } from '../modules/teams/hooks/useCurrentTeam.js';

/** The chip of the URL in the URL's team; editing controls for designers and owners only. */
export function ChipPage() {
  const { teamSlug, team, isLoading } = useCurrentTeam();
  const { chipId = '' } = useParams();
  if (isLoading) return <PageSpinner />;
  if (!team) return <NotFoundState title="Team not found" description={`You are not a member of a team called "${teamSlug}".`} />;
  return <ChipScreen key={chipId} teamId={team.id} teamSlug={team.slug} chipId={chipId} role={team.role} />;
}

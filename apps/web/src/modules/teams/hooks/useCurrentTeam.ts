// The team named by the :teamSlug of the URL, among the signed-in user's teams.
import type { MyTeam } from '@hexloom/contracts';
import { useParams } from 'react-router-dom';
import { useMe } from '../../auth/api/useMe.js';

export type CurrentTeam = { teamSlug: string; team: MyTeam | undefined; isLoading: boolean };

/** Finds the URL's team in GET /api/me; `team` is undefined when the user is not a member. */
export function useCurrentTeam(): CurrentTeam {
  const { teamSlug = '' } = useParams();
  const me = useMe();
  return { teamSlug, team: me.data?.teams.find((t) => t.slug === teamSlug), isLoading: me.isPending };
}

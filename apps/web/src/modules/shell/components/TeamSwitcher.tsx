// Navbar select to jump between the user's teams (shown only when there are several).
import { HTMLSelect } from '@blueprintjs/core';
import type { MyTeam } from '@hexloom/contracts';
import { useNavigate } from 'react-router-dom';
import { teamHomePath } from '../../../routes.js';

export type TeamSwitcherProps = { teams: readonly MyTeam[]; currentSlug: string | undefined };

/** A select of team names; choosing one opens that team's home. */
export function TeamSwitcher({ teams, currentSlug }: TeamSwitcherProps) {
  const navigate = useNavigate();
  if (teams.length < 2) return null;
  const placeholder = currentSlug && teams.some((t) => t.slug === currentSlug) ? [] : [{ value: '', label: 'Choose a team' }];
  return (
    <HTMLSelect
      minimal
      aria-label="Switch team"
      data-testid="team-switcher"
      value={currentSlug ?? ''}
      onChange={(event) => {
        if (event.currentTarget.value) void navigate(teamHomePath(event.currentTarget.value));
      }}
      options={[...placeholder, ...teams.map((t) => ({ value: t.slug, label: t.name }))]}
    />
  );
}

// Top bar of the signed-in app: mark, team switcher, team links, theme toggle, user and sign-out.
import { Alignment, Button, Navbar } from '@blueprintjs/core';
import type { Me } from '@hexloom/contracts';
import { Link, NavLink, useMatch } from 'react-router-dom';
import { ROUTES, teamHomePath, teamMembersPath, teamOutboxPath } from '../../../routes.js';
import { useSignOut } from '../../auth/api/useSignOut.js';
import { HexloomLogo } from '../../brand/components/HexloomLogo.js';
import { ThemeToggle } from '../../theme/components/ThemeToggle.js';
import { TeamSwitcher } from './TeamSwitcher.js';

/** The navbar for `me`; team links appear while a team page is open. */
export function AppNavbar({ me }: { me: Me }) {
  const teamMatch = useMatch({ path: `${ROUTES.teamHome}/*` });
  const teamSlug = teamMatch?.params.teamSlug;
  const team = me.teams.find((t) => t.slug === teamSlug);
  const signOut = useSignOut(() => window.location.assign(ROUTES.signIn));
  const linkClass = ({ isActive }: { isActive: boolean }) =>
    `bp6-button bp6-minimal hx-nav-link${isActive ? ' bp6-active' : ''}`;

  return (
    <Navbar className="hx-navbar bp6-dark">
      <Navbar.Group align={Alignment.START}>
        <Navbar.Heading>
          <Link to={ROUTES.root} aria-label="Hexloom home">
            <HexloomLogo sizePx={26} gapColour="var(--hx-navbar-bg)" />
            <span>Hexloom</span>
          </Link>
        </Navbar.Heading>
        <Navbar.Divider />
        <TeamSwitcher teams={me.teams} currentSlug={teamSlug} />
        {me.teams.length < 2 && team ? <span className="hx-navbar-team">{team.name}</span> : null}
        {team ? (
          <>
            <NavLink to={teamHomePath(team.slug)} end className={linkClass} data-testid="nav-home">
              Home
            </NavLink>
            <NavLink to={teamMembersPath(team.slug)} className={linkClass} data-testid="nav-members">
              Members
            </NavLink>
            {team.role === 'owner' ? (
              <NavLink to={teamOutboxPath(team.slug)} className={linkClass} data-testid="nav-outbox">
                Outbox
              </NavLink>
            ) : null}
          </>
        ) : null}
      </Navbar.Group>
      <Navbar.Group align={Alignment.END}>
        <ThemeToggle />
        <Navbar.Divider />
        <span className="hx-navbar-user" title={me.user.email ?? undefined}>
          {me.user.name} <span className="hx-mono hx-navbar-login">{me.user.login}</span>
        </span>
        <Button
          variant="minimal"
          icon="log-out"
          text="Sign out"
          data-testid="signout-button"
          loading={signOut.isPending}
          onClick={() => signOut.mutate()}
        />
      </Navbar.Group>
    </Navbar>
  );
}

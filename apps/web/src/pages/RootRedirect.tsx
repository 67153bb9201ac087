// /: sends a signed-in user to their first team (AppLayout already sent strangers to /signin).
import { NonIdealState } from '@blueprintjs/core';
import { Navigate } from 'react-router-dom';
import { teamHomePath } from '../routes.js';
import { useMe } from '../modules/auth/api/useMe.js';

/** Redirects to the first team's home, or explains that the user has no team yet. */
export function RootRedirect() {
  const me = useMe();
  const first = me.data?.teams[0];
  if (first) return <Navigate to={teamHomePath(first.slug)} replace />;
  return (
    <NonIdealState
      icon="people"
      title="You are not in a team yet"
      description="Ask an owner of your team to invite your e-mail address; the invitation is accepted when you next sign in."
    />
  );
}

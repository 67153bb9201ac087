// Frame of every signed-in page: loads the user, sends strangers to sign-in, draws the navbar.
import { Outlet, Navigate, useLocation } from 'react-router-dom';
import { signInPath } from '../../../routes.js';
import { ApiRequestError } from '../../core/api/ApiRequestError.js';
import { ApiErrorCallout } from '../../core/components/ApiErrorCallout.js';
import { PageSpinner } from '../../core/components/PageSpinner.js';
import { useMe } from '../../auth/api/useMe.js';
import { AppNavbar } from './AppNavbar.js';

/** Renders the navbar and the matched child page once GET /api/me succeeds. */
export function AppLayout() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <PageSpinner label="Loading your teams" />;
  if (me.isError) {
    if (me.error instanceof ApiRequestError && me.error.statusCode === 401) {
      return <Navigate to={signInPath(`${location.pathname}${location.search}`)} replace />;
    }
    return (
      <main className="hx-page">
        <ApiErrorCallout error={me.error} title="Hexloom could not reach its server" />
      </main>
    );
  }
  return (
    <>
      <AppNavbar me={me.data} />
      <main className="hx-page">
        <Outlet />
      </main>
    </>
  );
}

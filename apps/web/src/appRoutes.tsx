// The route tree of the web app.
import type { RouteObject } from 'react-router-dom';
import { ROUTES } from './routes.js';
import { AppLayout } from './modules/shell/components/AppLayout.js';
import { ChipPage } from './pages/ChipPage.js';
import { ConfigurationPage } from './pages/ConfigurationPage.js';
import { MembersPage } from './pages/MembersPage.js';
import { NotFoundPage } from './pages/NotFoundPage.js';
import { OutboxPage } from './pages/OutboxPage.js';
import { RootRedirect } from './pages/RootRedirect.js';
import { SignInPage } from './pages/SignInPage.js';
import { TeamHomePage } from './pages/TeamHomePage.js';

/** Public /signin, signed-in pages under AppLayout, and a catch-all 404. */
export const appRoutes: RouteObject[] = [
  { path: ROUTES.signIn, element: <SignInPage /> },
  {
    element: <AppLayout />,
    children: [
      { path: ROUTES.root, element: <RootRedirect /> },
      { path: ROUTES.teamHome, element: <TeamHomePage /> },
      { path: ROUTES.teamMembers, element: <MembersPage /> },
      { path: ROUTES.teamOutbox, element: <OutboxPage /> },
      { path: ROUTES.chip, element: <ChipPage /> },
      { path: ROUTES.configuration, element: <ConfigurationPage /> },
    ],
  },
  { path: ROUTES.notFound, element: <NotFoundPage /> },
];

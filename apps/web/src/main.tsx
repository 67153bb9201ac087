// Entry point of the Hexloom web app.
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/jetbrains-mono/400.css';
import '@blueprintjs/core/lib/css/blueprint.css';
import '@blueprintjs/icons/lib/css/blueprint-icons.css';
import '@blueprintjs/table/lib/css/table.css';
import './styles/hexloom.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createBrowserRouter } from 'react-router-dom';
import { AppProviders } from './AppProviders.js';
import { appRoutes } from './appRoutes.js';
import { createQueryClient } from './modules/core/api/createQueryClient.js';
import { showErrorToast } from './modules/core/utils/appToaster.js';
import { describeError } from './modules/core/utils/describeError.js';
import { ROUTES, signInPath } from './routes.js';

const router = createBrowserRouter(appRoutes);
const queryClient = createQueryClient({
  onUnauthorized: () => {
    const { pathname, search } = router.state.location;
    if (pathname !== ROUTES.signIn) void router.navigate(signInPath(`${pathname}${search}`), { replace: true });
  },
  onMutationError: (error, retry) => showErrorToast(describeError(error), retry),
});

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');
createRoot(container).render(
  <StrictMode>
    <AppProviders queryClient={queryClient} router={router} />
  </StrictMode>,
);

// Providers around the router: data cache, theme, Blueprint overlays and hotkeys.
import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { RouterProvider, type createBrowserRouter } from 'react-router-dom';
import { ThemeProvider } from './modules/theme/components/ThemeProvider.js';

export type AppProvidersProps = { queryClient: QueryClient; router: ReturnType<typeof createBrowserRouter> };

/** The whole app for a given query client and router (browser router in main, memory router in tests). */
export function AppProviders({ queryClient, router }: AppProvidersProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <ThemeProvider>
        <BlueprintProvider>
          <RouterProvider router={router} />
        </BlueprintProvider>
      </ThemeProvider>
    </QueryClientProvider>
  );
}

import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { RouterProvider, type createBrowserRouter } from 'react-router-dom';
import { setUnauthorizedHandler } from '../lib/api-client';
import { createQueryClient } from '../lib/query-client';
import { AppProviders } from './providers';
import { createAppRouter } from './router';

type AppRouter = ReturnType<typeof createBrowserRouter>;

/**
 * A lapsed or revoked token: back to sign-in (the client has already forgotten the token),
 * remembering the page, then drop every cached answer of the previous session.
 */
export function sendUnauthorizedToSignIn(router: AppRouter, queryClient: QueryClient): void {
  setUnauthorizedHandler(() => {
    const { pathname, search } = router.state.location;
    if (pathname === '/sign-in') return;
    const next = pathname === '/' ? '' : `?next=${encodeURIComponent(pathname + search)}`;
    void router.navigate(`/sign-in${next}`, { replace: true }).then(() => queryClient.clear());
  });
}

function createApp() {
  const queryClient = createQueryClient();
  const router = createAppRouter(queryClient);
  sendUnauthorizedToSignIn(router, queryClient);
  return { queryClient, router };
}

export function App() {
  const [{ queryClient, router }] = useState(createApp);
  return (
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  );
}

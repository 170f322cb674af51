import { useState } from 'react';
import { RouterProvider } from 'react-router-dom';
import { setUnauthorizedHandler } from '../lib/api-client';
import { createQueryClient } from '../lib/query-client';
import { AppProviders } from './providers';
import { createAppRouter } from './router';

function createApp() {
  const queryClient = createQueryClient();
  const router = createAppRouter(queryClient);
  // A lapsed or revoked token: back to sign-in (the client already forgot the token), then drop
  // every cached answer of the previous session.
  setUnauthorizedHandler(() => {
    const { pathname, search } = router.state.location;
    if (pathname === '/sign-in') return;
    const next = pathname === '/' ? '' : `?next=${encodeURIComponent(pathname + search)}`;
    void router.navigate(`/sign-in${next}`, { replace: true }).then(() => queryClient.clear());
  });
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

import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, Navigate, redirect, type RouteObject } from 'react-router-dom';
import { PageSpinner } from '../components/page-spinner';
import { AppLayout, appLayoutLoader } from './routes/app-layout';
import { NotFoundRoute } from './routes/not-found';
import { RouteError } from './routes/route-error';

/**
 * Routes. Pages load lazily; each loader prefetches with the same query options its page reads,
 * so the page renders from cache.
 */
export function appRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: '/sign-in',
      HydrateFallback: PageSpinner,
      ErrorBoundary: RouteError,
      lazy: async () => {
        const { SignInRoute, signInLoader } = await import('./routes/sign-in');
        return { Component: SignInRoute, loader: signInLoader };
      },
    },
    {
      path: '/setup',
      HydrateFallback: PageSpinner,
      ErrorBoundary: RouteError,
      lazy: async () => {
        const { SetupRoute, setupLoader } = await import('./routes/setup');
        return { Component: SetupRoute, loader: setupLoader(queryClient) };
      },
    },
    {
      path: '/',
      Component: AppLayout,
      loader: appLayoutLoader(queryClient),
      HydrateFallback: PageSpinner,
      ErrorBoundary: RouteError,
      children: [
        { index: true, loader: () => redirect('/assets'), element: <Navigate to="/assets" replace /> },
        {
          ErrorBoundary: RouteError,
          children: [
            {
              path: 'assets',
              lazy: async () => {
                const { AssetsRoute, assetsLoader } = await import('./routes/assets');
                return { Component: AssetsRoute, loader: assetsLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId',
              lazy: async () => {
                const { AssetRoute, assetLoader } = await import('./routes/asset');
                return { Component: AssetRoute, loader: assetLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/wells/:wellId',
              lazy: async () => {
                const { WellRoute, wellLoader } = await import('./routes/well');
                return { Component: WellRoute, loader: wellLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/wells/:wellId/workbench',
              lazy: async () => {
                const { WorkbenchRoute, workbenchLoader } = await import('./routes/workbench');
                return { Component: WorkbenchRoute, loader: workbenchLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/formations',
              lazy: async () => {
                const { FormationsRoute, formationsLoader } = await import('./routes/formations');
                return { Component: FormationsRoute, loader: formationsLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/zone-table',
              lazy: async () => {
                const { ZoneTableRoute, zoneTableLoader } = await import('./routes/zone-table');
                return { Component: ZoneTableRoute, loader: zoneTableLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/audit',
              lazy: async () => {
                const { AuditRoute, auditLoader } = await import('./routes/audit');
                return { Component: AuditRoute, loader: auditLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/reserves',
              lazy: async () => {
                const { ReservesCasesRoute, reservesCasesLoader } = await import('./routes/reserves-cases');
                return { Component: ReservesCasesRoute, loader: reservesCasesLoader(queryClient) };
              },
            },
            {
              path: 'assets/:assetId/reserves/:caseId',
              lazy: async () => {
                const { ReservesCaseRoute, reservesCaseLoader } = await import('./routes/reserves-case');
                return { Component: ReservesCaseRoute, loader: reservesCaseLoader(queryClient) };
              },
            },
            {
              path: 'account',
              lazy: async () => {
                const { AccountRoute, accountLoader } = await import('./routes/account');
                return { Component: AccountRoute, loader: accountLoader(queryClient) };
              },
            },
            {
              path: 'admin',
              lazy: async () => {
                const { AdminRoute, adminLoader } = await import('./routes/admin');
                return { Component: AdminRoute, loader: adminLoader(queryClient) };
              },
            },
            {
              path: 'admin/mail',
              lazy: async () => {
                const { AdminMailRoute, adminMailLoader } = await import('./routes/admin-mail');
                return { Component: AdminMailRoute, loader: adminMailLoader(queryClient) };
              },
            },
            { path: '*', Component: NotFoundRoute },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(appRoutes(queryClient));
}

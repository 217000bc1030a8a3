import type { QueryClient } from '@tanstack/react-query';
import { useMemo, type ComponentType } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '../components/errors/route-error';
import { PageLoading } from '../components/layout/page-loading';
import { paths } from '../config/paths';
import { AppLayout } from './app-layout';

/** A route module's page and, when it has one, the loader that prefetches its queries. */
type RouteModule = {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => NonNullable<RouteObject['loader']>;
};

// Each page is its own chunk; the shell around it is in the entry chunk.
function lazyPage(queryClient: QueryClient, load: () => Promise<RouteModule>) {
  return {
    lazy: async () => {
      const module = await load();
      return {
        Component: module.default,
        loader: module.clientLoader?.(queryClient),
      };
    },
    // Known before the module loads, so the first paint shows the shell with a placeholder.
    HydrateFallback: PageLoading,
    ErrorBoundary: RouteError,
  } satisfies RouteObject;
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      Component: AppLayout,
      ErrorBoundary: RouteError,
      children: [
        { index: true, ...lazyPage(queryClient, () => import('./routes/boards')) },
        { path: paths.boards.path, ...lazyPage(queryClient, () => import('./routes/boards')) },
        { path: paths.board.path, ...lazyPage(queryClient, () => import('./routes/board')) },
        { path: paths.net.path, ...lazyPage(queryClient, () => import('./routes/net')) },
        {
          path: paths.component.path,
          ...lazyPage(queryClient, () => import('./routes/component')),
        },
        {
          path: paths.boardCases.path,
          ...lazyPage(queryClient, () => import('./routes/board-cases')),
        },
        { path: paths.newCase.path, ...lazyPage(queryClient, () => import('./routes/new-case')) },
        { path: paths.case.path, ...lazyPage(queryClient, () => import('./routes/case')) },
        { path: paths.editCase.path, ...lazyPage(queryClient, () => import('./routes/edit-case')) },
        {
          path: paths.caseHistory.path,
          ...lazyPage(queryClient, () => import('./routes/case-history')),
        },
        {
          path: paths.boardImport.path,
          ...lazyPage(queryClient, () => import('./routes/board-import')),
        },
        {
          path: paths.newBoardImport.path,
          ...lazyPage(queryClient, () => import('./routes/new-board-import')),
        },
        { path: paths.search.path, ...lazyPage(queryClient, () => import('./routes/search')) },
        { path: paths.admin.path, ...lazyPage(queryClient, () => import('./routes/admin')) },
        {
          path: paths.moderation.path,
          ...lazyPage(queryClient, () => import('./routes/moderation')),
        },
        {
          path: paths.notificationSettings.path,
          ...lazyPage(queryClient, () => import('./routes/notification-settings')),
        },
        { path: paths.mailbox.path, ...lazyPage(queryClient, () => import('./routes/mailbox')) },
        { path: '*', ...lazyPage(queryClient, () => import('./routes/not-found')) },
      ],
    },
  ]);
}

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const router = useMemo(() => createAppRouter(queryClient), [queryClient]);
  return <RouterProvider router={router} />;
}

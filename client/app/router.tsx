import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { AppShell } from '../components/layouts/app-shell';
import { RouteError } from '../components/errors/route-error';
import { FullPageSpinner } from '../components/ui/spinner';

export function createRouter(_queryClient: QueryClient) {
  return createBrowserRouter([
    {
      path: '/',
      element: <AppShell />,
      errorElement: <RouteError />,
      HydrateFallback: FullPageSpinner,
      children: [
        { index: true, lazy: () => import('./routes/home') },
        { path: '*', lazy: () => import('./routes/not-found') },
      ],
    },
  ]);
}

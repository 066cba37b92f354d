import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect, type LoaderFunctionArgs } from 'react-router';
import { RouteError } from '../components/errors/route-error';
import { PublicLayout } from '../components/layouts/public-layout';
import { FullPageSpinner } from '../components/ui/spinner';
import { meQuery } from '../features/auth/api/me';
import { SignedInLayout } from './signed-in-layout';

/** Signed-in pages: the loader makes sure /me is known and sends visitors to sign in first. */
const requireSession = (qc: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  const me = await qc.fetchQuery(meQuery());
  if (!me) {
    const url = new URL(request.url);
    throw redirect(`/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`);
  }
  return null;
};

export function createRouter(queryClient: QueryClient) {
  return createBrowserRouter([
    {
      errorElement: <RouteError />,
      HydrateFallback: FullPageSpinner,
      children: [
        {
          element: <PublicLayout />,
          children: [
            { path: '/sign-in', lazy: () => import('./routes/sign-in') },
            { path: '/forgot-password', lazy: () => import('./routes/forgot-password') },
            { path: '/reset-password', lazy: () => import('./routes/reset-password') },
            { path: '/invites/accept', lazy: () => import('./routes/accept-invite') },
          ],
        },
        {
          path: '/',
          element: <SignedInLayout />,
          loader: requireSession(queryClient),
          children: [
            { index: true, lazy: () => import('./routes/home') },
            { path: 'profile', lazy: () => import('./routes/profile') },
            { path: 'club', lazy: () => import('./routes/club') },
            { path: 'tanks', lazy: () => import('./routes/coming-soon') },
            { path: 'desk', lazy: () => import('./routes/coming-soon') },
            { path: '*', lazy: () => import('./routes/not-found') },
          ],
        },
      ],
    },
  ]);
}

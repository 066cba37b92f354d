import { FullPageLoading } from '@client/components/ui/skeleton';
import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, redirect, type LoaderFunctionArgs } from 'react-router';
import { RouteError } from '@client/components/errors/route-error';
import { PublicLayout } from '@client/components/layouts/public-layout';

import { meQuery } from '@client/features/auth/api/me';
import { SignedInLayout } from './signed-in-layout';

/** Signed-in pages: the loader makes sure /me is known and sends visitors to sign in first. */
const requireSession =
  (qc: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
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
      HydrateFallback: FullPageLoading,
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
            { path: 'club/profiles', lazy: () => import('./routes/care-profiles') },
            { path: 'club/profiles/:key', lazy: () => import('./routes/care-profile') },
            { path: 'tanks', lazy: () => import('./routes/tanks') },
            { path: 'tanks/new', lazy: () => import('./routes/tank-new') },
            { path: 'tanks/:tankId', lazy: () => import('./routes/tank') },
            { path: 'tanks/:tankId/edit', lazy: () => import('./routes/tank-edit') },
            { path: 'tanks/:tankId/tests/new', lazy: () => import('./routes/tank-test-new') },
            { path: 'tanks/:tankId/tests/:testId/edit', lazy: () => import('./routes/tank-test-edit') },
            { path: 'tanks/:tankId/entries/new', lazy: () => import('./routes/tank-entry-new') },
            { path: 'tanks/:tankId/import', lazy: () => import('./routes/tank-import') },
            { path: 'questions', lazy: () => import('./routes/questions') },
            { path: 'questions/:questionId', lazy: () => import('./routes/question') },
            { path: 'desk', lazy: () => import('./routes/desk') },
            { path: 'meetups', lazy: () => import('./routes/meetups') },
            { path: 'meetups/new', lazy: () => import('./routes/meetup-new') },
            { path: 'meetups/attendance/:userId', lazy: () => import('./routes/meetup-attendance') },
            { path: 'meetups/:meetupId', lazy: () => import('./routes/meetup') },
            { path: 'meetups/:meetupId/edit', lazy: () => import('./routes/meetup-edit') },
            { path: 'meetups/:meetupId/check-in', lazy: () => import('./routes/meetup-check-in') },
            { path: '*', lazy: () => import('./routes/not-found') },
          ],
        },
      ],
    },
  ]);
}

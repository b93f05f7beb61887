import { createBrowserRouter } from 'react-router';
import { AppShell } from '../components/layout/AppShell';
import { LoadingBlock } from '../components/ui/Spinner';
import { setUnauthorizedHandler } from '../lib/api-client';
import { queryClient } from '../lib/query-client';
import { authKeys } from '../features/auth/api/auth-keys';
import { requireUser } from './require-user';
import { NotFoundPage } from './routes/not-found';
import { RouteError } from './routes/route-error';
import { signInUrl } from './safe-next';

/**
 * Route table. Pages load lazily so the entry chunk stays small; every
 * signed-in page sits under the guard loader and the app shell.
 */
export const router = createBrowserRouter([
  {
    path: '/sign-in',
    lazy: () => import('./routes/sign-in'),
    errorElement: <RouteError />,
    HydrateFallback: () => <LoadingBlock />,
  },
  {
    id: 'signed-in',
    loader: requireUser,
    Component: AppShell,
    errorElement: <RouteError />,
    HydrateFallback: () => <LoadingBlock />,
    children: [
      {
        errorElement: <RouteError />,
        children: [
          { index: true, lazy: () => import('./routes/jobs') },
          { path: 'jobs/:jobId', lazy: () => import('./routes/job') },
          { path: 'spools/:spoolId', lazy: () => import('./routes/spool') },
          { path: 'users', lazy: () => import('./routes/users') },
          { path: '*', Component: NotFoundPage },
        ],
      },
    ],
  },
]);

// A session that expires mid-work (any API call answering 401) goes back to sign-in, then returns here.
setUnauthorizedHandler(() => {
  const here = window.location.pathname + window.location.search;
  queryClient.setQueryData(authKeys.me(), null);
  if (!window.location.pathname.startsWith('/sign-in')) void router.navigate(signInUrl(here), { replace: true });
});

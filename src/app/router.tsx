import {
  createBrowserRouter,
  Outlet,
  redirect,
  ScrollRestoration,
  type LoaderFunctionArgs,
  type RouteObject,
} from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import { authQueries } from '../features/auth/api';
import { teamQueries } from '../features/team/api';
import { vesselQueries } from '../features/vessels/api';
import { AppShell } from './shell/app-shell';
import { RouteError } from './shell/route-error';
import { safeNextPath, signInPath } from '../shell/sign-in-path';
import { ReloadPage, Splash } from '../shell/splash';

const errorElement = <RouteError />;

function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Signed-in routes wait for the session on arrival, so nobody sees a page they may not open. */
const requireSession =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(authQueries.me());
    if (!user) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    return null;
  };

/** Someone already signed in has no business on the sign-in page. */
const skipSignInWhenSignedIn =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(authQueries.me()).catch(() => null);
    if (user) throw redirect(safeNextPath(new URL(request.url).searchParams.get('next')));
    return null;
  };

/** Starts a page's data while its code loads; the page's own query picks the result up. */
const prefetch = (start: () => void) => () => {
  start();
  return null;
};

/** The pages inside the app shell: each waits for a signed-in session (requireSession). */
function signedInRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      index: true,
      loader: prefetch(() => void queryClient.prefetchQuery(vesselQueries.list())),
      lazy: () => import('./routes/home'),
      errorElement,
    },
    {
      path: 'team',
      loader: prefetch(() => {
        if (queryClient.getQueryData(authQueries.me().queryKey)?.role !== 'manager') return;
        void queryClient.prefetchQuery(teamQueries.users());
        void queryClient.prefetchQuery(vesselQueries.list());
      }),
      lazy: () => import('./routes/team'),
      errorElement,
    },
    // The deck is its own app (src/deck); the address is already /deck…, so load the page.
    { path: 'deck/*', element: <ReloadPage /> },
    { path: 'vessels', lazy: () => import('./routes/vessels'), errorElement },
    { path: 'vessels/:id', lazy: () => import('./routes/vessel'), errorElement },
    { path: 'vessels/:id/decide', lazy: () => import('./routes/vessel-decide'), errorElement },
    { path: 'engines/:id', lazy: () => import('./routes/engine'), errorElement },
    {
      path: 'engines/:id/checklist',
      lazy: () => import('./routes/engine-checklist'),
      errorElement,
    },
    { path: 'runs', lazy: () => import('./routes/runs'), errorElement },
    { path: 'runs/:id', lazy: () => import('./routes/run'), errorElement },
    { path: 'runs/:id/review', lazy: () => import('./routes/run-review'), errorElement },
    { path: 'account', lazy: () => import('./routes/account'), errorElement },
    { path: 'programs', lazy: () => import('./routes/programs'), errorElement },
    { path: 'programs/:id', lazy: () => import('./routes/program'), errorElement },
    { path: '*', lazy: () => import('./routes/not-found'), errorElement },
  ];
}

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      element: <RootLayout />,
      errorElement,
      hydrateFallbackElement: <Splash />,
      children: [
        {
          path: 'sign-in',
          loader: skipSignInWhenSignedIn(queryClient),
          lazy: () => import('./routes/sign-in'),
          errorElement,
        },
        { path: 'invite/:token', lazy: () => import('./routes/accept-invite'), errorElement },
        { path: 'forgot-password', lazy: () => import('./routes/forgot-password'), errorElement },
        {
          path: 'reset-password/:token',
          lazy: () => import('./routes/reset-password'),
          errorElement,
        },
        {
          id: 'session',
          loader: requireSession(queryClient),
          element: <AppShell />,
          errorElement,
          children: signedInRoutes(queryClient),
        },
      ],
    },
  ];
}

export const createAppRouter = (queryClient: QueryClient) =>
  createBrowserRouter(createRoutes(queryClient));

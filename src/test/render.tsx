import type { ReactElement } from 'react';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import type { QueryClient } from '@tanstack/react-query';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { AppProviders, createAppQueryClient } from '../app/providers';

export function createTestQueryClient(): QueryClient {
  const queryClient = createAppQueryClient();
  queryClient.setDefaultOptions({
    queries: { retry: false, staleTime: Infinity },
    mutations: { retry: false },
  });
  return queryClient;
}

export const testUser = (role: SessionUser['role'], name = 'Ada Harbour'): SessionUser => ({
  id: `user-${role}`,
  email: `${role}@example.com`,
  name,
  role,
  workshopId: 'workshop-1',
  workshopName: 'Quayside Marine Works',
});

/** Renders routes in a memory router with the app's providers; returns the router to inspect. */
export function renderRoutes(
  routes: RouteObject[],
  { at = '/', queryClient = createTestQueryClient() } = {},
) {
  const router = createMemoryRouter(routes, { initialEntries: [at] });
  const utils = render(
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...utils, router, queryClient };
}

/** Renders one element on a page of its own, with a second page to see where it navigates to. */
export function renderPage(
  element: ReactElement,
  options: { at?: string; path?: string; queryClient?: QueryClient } = {},
) {
  const { path = '/', ...rest } = options;
  return renderRoutes(
    [
      { path, element },
      { path: '*', element: <p>Elsewhere</p> },
    ],
    { at: rest.at ?? path, ...rest },
  );
}

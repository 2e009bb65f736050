import type { ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { authKeys } from '../features/auth/api';
import { createQueryClient } from '../lib/query-client';

/** The app's query client: any 401 means the session is gone, so the guard sends the user to sign in. */
export function createAppQueryClient(): QueryClient {
  const queryClient: QueryClient = createQueryClient({
    onUnauthorized: () => queryClient.setQueryData(authKeys.me(), null),
  });
  return queryClient;
}

export function AppProviders({
  queryClient,
  children,
}: {
  queryClient: QueryClient;
  children: ReactNode;
}) {
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}

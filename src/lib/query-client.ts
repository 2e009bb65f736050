import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

interface QueryClientOptions {
  /** Called when any request answers 401 (session expired or signed out elsewhere). */
  onUnauthorized?: () => void;
}

/** Client errors (4xx) will not change on a retry; network and server errors may. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient({ onUnauthorized }: QueryClientOptions = {}): QueryClient {
  const handleError = (error: unknown) => {
    if (isApiError(error) && error.status === 401) onUnauthorized?.();
  };
  return new QueryClient({
    queryCache: new QueryCache({ onError: handleError }),
    mutationCache: new MutationCache({ onError: handleError }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}

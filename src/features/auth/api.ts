import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { AcceptInviteInput, InvitePreview, SessionUser, SignInInput } from '../../../shared/auth/auth.schema';
import { api, isApiError } from '../../lib/api-client';
import { cachedUser, clearUserData, rememberUser } from '../../lib/db';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  invite: (token: string) => [...authKeys.all, 'invite', token] as const,
  signIn: () => [...authKeys.all, 'sign-in'] as const,
  signOut: () => [...authKeys.all, 'sign-out'] as const,
  acceptInvite: () => [...authKeys.all, 'accept-invite'] as const,
};

/** The device database must never stand in the way of signing in: a failure there is only logged. */
const quietly = <T,>(work: Promise<T>) => work.catch((error: unknown) => console.warn('Ringseat: the device database failed.', error));

/**
 * The signed-in user, or null when nobody is signed in (401 is an answer here, not an error).
 * With no network at all (at sea) the user the server last confirmed on this device stands in,
 * so the app opens offline; a 401 means signed out and clears the user's copies on the device.
 */
async function fetchMe(signal?: AbortSignal): Promise<SessionUser | null> {
  try {
    const { user } = await api.get<{ user: SessionUser }>('/api/auth/me', signal);
    await quietly(rememberUser(user));
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      await quietly(clearUserData());
      return null;
    }
    if (isApiError(error) && error.isNetworkError) {
      const cached = await cachedUser().catch(() => null);
      if (cached) return cached;
    }
    throw error;
  }
}

export const authQueries = {
  me: () =>
    queryOptions({
      queryKey: authKeys.me(),
      queryFn: ({ signal }) => fetchMe(signal),
      staleTime: 5 * 60_000,
      // Asked even when the browser reports no network: the answer then comes from the device.
      networkMode: 'always',
    }),
  invite: (token: string) =>
    queryOptions({
      queryKey: authKeys.invite(token),
      queryFn: ({ signal }) => api.get<InvitePreview>(`/api/invites/${encodeURIComponent(token)}`, signal),
      retry: false,
      staleTime: 60_000,
    }),
};

/** Forget everything cached for the previous session, then record who is signed in now. */
export function replaceSession(queryClient: QueryClient, user: SessionUser | null): void {
  queryClient.clear();
  queryClient.setQueryData(authKeys.me(), user);
  void quietly(user ? rememberUser(user) : clearUserData());
}

export const useMe = () => useQuery(authQueries.me());

export const useInvitePreview = (token: string) => useQuery(authQueries.invite(token));

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: authKeys.signIn(),
    mutationFn: (input: SignInInput) => api.post<{ user: SessionUser }>('/api/auth/sign-in', input),
    onSuccess: ({ user }) => replaceSession(queryClient, user),
  });
}

export function useAcceptInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: authKeys.acceptInvite(),
    mutationFn: (input: AcceptInviteInput) => api.post<{ user: SessionUser }>('/api/auth/accept-invite', input),
    onSuccess: ({ user }) => replaceSession(queryClient, user),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: authKeys.signOut(),
    mutationFn: async () => {
      try {
        await api.post<void>('/api/auth/sign-out');
      } catch (error) {
        // Already signed out on the server (expired session): the goal is reached.
        if (!(isApiError(error) && error.status === 401)) throw error;
      }
    },
    onSuccess: () => replaceSession(queryClient, null),
  });
}

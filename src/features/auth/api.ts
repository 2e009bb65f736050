import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import type {
  AcceptInviteInput,
  InvitePreview,
  SessionUser,
  SignInInput,
} from '../../../shared/auth/auth.schema';
import { api } from '../../lib/api-client';
import { fetchSessionUser, quietly, signOutOnServer } from './session-user';
import { clearUserData, rememberUser } from '../../lib/db';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  invite: (token: string) => [...authKeys.all, 'invite', token] as const,
  signIn: () => [...authKeys.all, 'sign-in'] as const,
  signOut: () => [...authKeys.all, 'sign-out'] as const,
  acceptInvite: () => [...authKeys.all, 'accept-invite'] as const,
};

export const authQueries = {
  me: () =>
    queryOptions({
      queryKey: authKeys.me(),
      queryFn: ({ signal }) => fetchSessionUser(signal),
      staleTime: 5 * 60_000,
      // Asked even when the browser reports no network: the answer then comes from the device.
      networkMode: 'always',
    }),
  invite: (token: string) =>
    queryOptions({
      queryKey: authKeys.invite(token),
      queryFn: ({ signal }) =>
        api.get<InvitePreview>(`/api/invites/${encodeURIComponent(token)}`, signal),
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
    mutationFn: (input: AcceptInviteInput) =>
      api.post<{ user: SessionUser }>('/api/auth/accept-invite', input),
    onSuccess: ({ user }) => replaceSession(queryClient, user),
  });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: authKeys.signOut(),
    mutationFn: signOutOnServer,
    onSuccess: () => replaceSession(queryClient, null),
  });
}

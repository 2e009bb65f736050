import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AccountView,
  ChangePasswordInput,
  PasswordResetRequest,
  ResetPasswordInput,
  ResetPreview,
} from '../../../shared/auth/account.schema';
import type { SessionUser } from '../../../shared/auth/auth.schema';
import { api } from '../../lib/api-client';
import { replaceSession } from './api';

export const accountKeys = {
  all: ['account'] as const,
  mine: () => [...accountKeys.all, 'mine'] as const,
  reset: (token: string) => [...accountKeys.all, 'reset', token] as const,
};

export const accountQueries = {
  mine: () =>
    queryOptions({
      queryKey: accountKeys.mine(),
      queryFn: ({ signal }) => api.get<AccountView>('/api/account', signal),
    }),
  reset: (token: string) =>
    queryOptions({
      queryKey: accountKeys.reset(token),
      queryFn: ({ signal }) =>
        api.get<ResetPreview>(`/api/password-resets/${encodeURIComponent(token)}`, signal),
      retry: false,
      staleTime: 60_000,
    }),
};

/** The signed-in person's own account: address, name, devices signed in. */
export const useAccount = () => useQuery(accountQueries.mine());

export const useResetPreview = (token: string) => useQuery(accountQueries.reset(token));

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangePasswordInput) =>
      api.post<AccountView>('/api/account/password', input),
    onSuccess: (view) => queryClient.setQueryData(accountKeys.mine(), view),
  });
}

/** Ends every session of the person; this device then signs out like "Sign out". */
export function useSignOutEverywhere() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/account/sign-out-everywhere'),
    onSuccess: () => replaceSession(queryClient, null),
  });
}

export const useRequestReset = () =>
  useMutation({
    mutationFn: (input: PasswordResetRequest) =>
      api.post<{ detail: string }>('/api/auth/password-reset', input),
  });

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ResetPasswordInput) =>
      api.post<{ user: SessionUser }>('/api/auth/reset-password', input),
    onSuccess: ({ user }) => replaceSession(queryClient, user),
  });
}

import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AccountChange } from '../../../shared/auth/account.schema';
import type { InviteInput, Role } from '../../../shared/auth/auth.schema';
import type { OutgoingMailView } from '../../../shared/mail/outgoing-mail';
import { api } from '../../lib/api-client';

export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: Role;
  createdAt: string;
  /** When the person was deactivated; null while they may sign in. */
  archivedAt: string | null;
}

export interface TeamInvite {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  acceptedAt: string | null;
  revokedAt: string | null;
}

export interface SentInvite {
  invite: Omit<TeamInvite, 'acceptedAt' | 'revokedAt'>;
  /** The link the invited person opens to set a password. */
  link: string;
}

export const teamKeys = {
  all: ['team'] as const,
  users: () => [...teamKeys.all, 'users'] as const,
  sendInvite: () => [...teamKeys.all, 'send-invite'] as const,
  history: () => [...teamKeys.all, 'history'] as const,
};

export const teamQueries = {
  users: () =>
    queryOptions({
      queryKey: teamKeys.users(),
      queryFn: ({ signal }) =>
        api.get<{ users: TeamMember[]; invites: TeamInvite[] }>('/api/users', signal),
    }),
};

/** The workshop's people and invites (managers only). */
export const useUsers = () => useQuery(teamQueries.users());

export function useInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: teamKeys.sendInvite(),
    mutationFn: (input: InviteInput) => api.post<SentInvite>('/api/invites', input),
    // The team list and the outgoing e-mail both show the new invite.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}

/** Every change to people and invites: after one, the lists, the history and the outbox refresh. */
function useTeamChange<T, V>(mutationFn: (variables: V) => Promise<T>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}

export const useChangeRole = () =>
  useTeamChange(({ id, role }: { id: string; role: Role }) =>
    api.patch<TeamMember>(`/api/users/${id}`, { role }),
  );

export const useSetActive = () =>
  useTeamChange(({ id, active }: { id: string; active: boolean }) =>
    api.post<TeamMember>(`/api/users/${id}/${active ? 'reactivate' : 'deactivate'}`),
  );

export const useResendInvite = () =>
  useTeamChange((id: string) => api.post<SentInvite>(`/api/invites/${id}/resend`));

export const useRevokeInvite = () =>
  useTeamChange((id: string) => api.post<unknown>(`/api/invites/${id}/revoke`));

/** The team's account history, newest first (managers only). */
export const useTeamHistory = () =>
  useQuery({
    queryKey: teamKeys.history(),
    queryFn: ({ signal }) => api.get<{ changes: AccountChange[] }>('/api/team/history', signal),
  });

export const roleLabel: Record<Role, string> = {
  skipper: 'Skipper',
  technician: 'Technician',
  manager: 'Manager',
};

export const mailKeys = {
  outgoing: () => [...teamKeys.all, 'outgoing-mail'] as const,
};

/** The workshop's outbox: what went, what waits and why (managers only). Refreshed each minute. */
export const useOutgoingMail = () =>
  useQuery({
    queryKey: mailKeys.outgoing(),
    queryFn: ({ signal }) => api.get<{ mail: OutgoingMailView[] }>('/api/mail/outgoing', signal),
    refetchInterval: 60_000,
  });

export function useRetryMail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      api.post<{ mail: OutgoingMailView }>(`/api/mail/outgoing/${id}/retry`, {}),
    onSettled: () => queryClient.invalidateQueries({ queryKey: mailKeys.outgoing() }),
  });
}

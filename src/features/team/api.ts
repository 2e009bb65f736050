import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InviteInput, Role } from '../../../shared/auth/auth.schema';
import type { OutgoingMailView } from '../../../shared/mail/outgoing-mail';
import { api } from '../../lib/api-client';

export interface TeamMember {
  id: string;
  email: string;
  name: string;
  role: Role;
  createdAt: string;
}

export interface TeamInvite {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  acceptedAt: string | null;
}

export interface SentInvite {
  invite: Omit<TeamInvite, 'acceptedAt'>;
  /** The link the invited person opens to set a password. */
  link: string;
}

export const teamKeys = {
  all: ['team'] as const,
  users: () => [...teamKeys.all, 'users'] as const,
  sendInvite: () => [...teamKeys.all, 'send-invite'] as const,
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

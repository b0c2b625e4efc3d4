import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { User } from '@/shared/api/auth';
import type { AcceptInvitationBody, InvitationBody, InvitationPreview, MemberPatchBody, PendingInvitation, TeamResponse } from '@/shared/api/team';
import { api } from '@/lib/api/client';
import { authKeys } from '@/lib/api/auth';
import { mailKeys } from '@/lib/api/mail';
import { useSessionPending } from '@/lib/api/session-gate';

export const teamKeys = {
  all: ['team'] as const,
  current: () => [...teamKeys.all, 'current'] as const,
  invitation: (token: string) => ['invitation', token] as const,
};

/** Membership changes rarely and only by admins; a minute keeps the screens calm without going stale. */
export const TEAM_STALE_MS = 60_000;

/**
 * `fresh`: ask the server again whenever the screen opens (the Team screen: someone may have accepted
 * an invitation since), while the shell's copy for the team's name stays calm.
 */
export function useTeam(options: { enabled?: boolean; fresh?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: teamKeys.current(),
    queryFn: () => api.get<TeamResponse>('/api/team'),
    staleTime: TEAM_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
    refetchOnMount: options.fresh ? 'always' : true,
  });
}

function useTeamMutation<TVars, TResult>(mutationFn: (vars: TVars) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}

export function useInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: InvitationBody) => api.post<{ invitation: PendingInvitation }>('/api/team/invitations', body),
    // The invitation e-mail lands in the dev mailbox too.
    onSuccess: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: teamKeys.all }),
      queryClient.invalidateQueries({ queryKey: mailKeys.all }),
    ]),
  });
}

export function useRevokeInvitation() {
  return useTeamMutation((id: number) => api.delete(`/api/team/invitations/${id}`));
}

export function useChangeRole() {
  return useTeamMutation(({ id, role }: { id: number } & MemberPatchBody) =>
    api.patch<unknown>(`/api/team/members/${id}`, { role }),
  );
}

export function useRemoveMember() {
  return useTeamMutation((id: number) => api.delete(`/api/team/members/${id}`));
}

export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: teamKeys.invitation(token),
    queryFn: () => api.get<{ invitation: InvitationPreview }>(`/api/invitations/${encodeURIComponent(token)}`),
    select: (data) => data.invitation,
    staleTime: TEAM_STALE_MS,
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInvitationBody) =>
      api.post<{ user: User }>(`/api/invitations/${encodeURIComponent(token)}/accept`, body),
    onSuccess: ({ user }) => {
      // Accepting signs the browser in as the new member, replacing whoever was signed in.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}

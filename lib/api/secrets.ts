import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GenerateResponse, GenerateSecretsBody, RevealResponse, SecretsStatusResponse } from '@/shared/api/secrets';
import { api } from '@/lib/api/client';
import { designKeys } from '@/lib/api/designs';
import { useSessionPending } from '@/lib/api/session-gate';

/**
 * CHAP secrets of a design (api.md). The status holds no secret and is a query. Showing secrets is
 * recorded on the server each time, so it is a mutation the person starts, never a query that a
 * refetch or a remount could repeat, and what it answers is kept only in the screen's own state.
 */
export const secretKeys = {
  status: (id: number) => [...designKeys.design(id), 'secrets', 'status'] as const,
};

export function useSecretsStatus(id: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: secretKeys.status(id),
    queryFn: () => api.get<SecretsStatusResponse>(`/api/designs/${id}/secrets/status`),
    select: (data) => data.status,
    // Secrets change only when someone makes or shows them, which refreshes this at once.
    staleTime: 30_000,
    enabled: !pending && (options.enabled ?? true),
  });
}

export function useGenerateSecrets(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: GenerateSecretsBody) => api.post<GenerateResponse>(`/api/designs/${id}/secrets`, body),
    onSettled: () => queryClient.invalidateQueries({ queryKey: secretKeys.status(id) }),
  });
}

/** Show one host's secrets (`host`), recorded on the server as a showing by the signed-in person. */
export function useRevealSecrets(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (host: string) => api.get<RevealResponse>(`/api/designs/${id}/secrets?host=${encodeURIComponent(host)}`),
    gcTime: 0,
    onSettled: () => queryClient.invalidateQueries({ queryKey: secretKeys.status(id) }),
  });
}

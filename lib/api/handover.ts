import { useQuery } from '@tanstack/react-query';
import type { LoginPlanResponse } from '@/shared/api/handover';
import { api } from '@/lib/api/client';
import { designKeys, VERSION_STALE_MS } from '@/lib/api/designs';
import { useSessionPending } from '@/lib/api/session-gate';

/** The handover routes of a version (docs/api.md). A version never changes, so neither does its plan. */
export const handoverKeys = {
  loginPlan: (id: number, n: number) => [...designKeys.version(id, n), 'login-plan'] as const,
};

export function useLoginPlan(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: handoverKeys.loginPlan(id, n),
    queryFn: () => api.get<LoginPlanResponse>(`/api/designs/${id}/versions/${n}/login-plan`),
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateDesignBody, CreateDesignResponse, DesignResponse, DesignsResponse } from '@/shared/api/designs';
import { useSessionPending } from '@/lib/api/session-gate';
import { api } from '@/lib/api/client';

/**
 * Designs and their versions share one key tree, so a saved version or a review step can refresh
 * everything about its design (list row, design screen, version screens) with one invalidation.
 */
export const designKeys = {
  all: ['designs'] as const,
  lists: () => [...designKeys.all, 'list'] as const,
  list: (q: string) => [...designKeys.lists(), q] as const,
  design: (id: number) => [...designKeys.all, 'design', id] as const,
  version: (id: number, n: number) => [...designKeys.design(id), 'version', n] as const,
  report: (id: number, n: number) => [...designKeys.version(id, n), 'report'] as const,
  diff: (id: number, from: number, to: number) => [...designKeys.design(id), 'diff', from, to] as const,
};

/** Lists and review states change when teammates act, so they are looked at again after half a minute. */
export const DESIGNS_STALE_MS = 30_000;
/**
 * A version's document never changes once saved (api.md): documents, reports and diffs stay cached.
 * Its review thread does change; screens read that from the design query, which goes stale.
 */
export const VERSION_STALE_MS = Infinity;

export function useDesigns(q = '') {
  const query = q.trim();
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.list(query),
    queryFn: () => api.get<DesignsResponse>(query ? `/api/designs?q=${encodeURIComponent(query)}` : '/api/designs'),
    select: (data) => data.designs,
    staleTime: DESIGNS_STALE_MS,
    // Keep the previous rows on screen while a new search term is being answered.
    placeholderData: (previous) => previous,
    enabled: !pending,
  });
}

export function useDesign(id: number) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.design(id),
    queryFn: () => api.get<DesignResponse>(`/api/designs/${id}`),
    staleTime: DESIGNS_STALE_MS,
    enabled: !pending,
  });
}

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateDesignBody) => api.post<CreateDesignResponse>('/api/designs', body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: designKeys.lists() }),
  });
}

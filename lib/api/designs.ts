import { useInfiniteQuery, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
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
  reportPage: (id: number, n: number) => [...designKeys.version(id, n), 'report-page'] as const,
  afterOne: (id: number, n: number) => [...designKeys.version(id, n), 'after-one'] as const,
  diff: (id: number, from: number, to: number) => [...designKeys.design(id), 'diff', from, to] as const,
};

/** Lists and review states change when teammates act, so they are looked at again after half a minute. */
export const DESIGNS_STALE_MS = 30_000;
/**
 * A version's document never changes once saved (docs/api.md): documents, reports and diffs stay cached.
 * Its review thread does change; screens read that from the design query, which goes stale.
 */
export const VERSION_STALE_MS = Infinity;

/** GET /api/designs with the search term and the page to start after, each only when there is one. */
export function designsPath(q: string, cursor: string | null): string {
  const params = new URLSearchParams();
  if (q) params.set('q', q);
  if (cursor) params.set('cursor', cursor);
  const query = params.toString();
  return query ? `/api/designs?${query}` : '/api/designs';
}

/**
 * The designs list, a page at a time (the server pages it, most recently changed first). `data` is
 * every row loaded so far and the number of matches in all; `fetchNextPage` loads the next page
 * while `hasNextPage`.
 */
export function useDesigns(q = '') {
  const query = q.trim();
  const pending = useSessionPending();
  return useInfiniteQuery({
    queryKey: designKeys.list(query),
    queryFn: ({ pageParam }) => api.get<DesignsResponse>(designsPath(query, pageParam)),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor ?? null,
    select: (data) => {
      const designs = data.pages.flatMap((page) => page.designs);
      return { designs, total: data.pages[0]?.total ?? designs.length };
    },
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

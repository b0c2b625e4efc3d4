import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReviewBody, ReviewResponse } from '@/shared/api/designs';
import { api } from '@/lib/api/client';
import { designKeys } from '@/lib/api/designs';

/**
 * One review step on a version (submit, approve, request changes). Screens read review threads from
 * the design query (its versions list), so that is what the step refreshes, with the list's status.
 */
export function useReviewAction(id: number, n: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReviewBody) => api.post<ReviewResponse>(`/api/designs/${id}/versions/${n}/review`, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: designKeys.design(id), exact: true }),
        queryClient.invalidateQueries({ queryKey: designKeys.version(id, n), exact: true }),
        queryClient.invalidateQueries({ queryKey: designKeys.lists() }),
      ]),
  });
}

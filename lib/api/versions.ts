import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AfterOneResponse, DiffResponse, ReportPageResponse, ReportResponse, RestoreBody, SaveVersionBody, SaveVersionResponse, VersionResponse } from '@/shared/api/designs';
import { api, isApiRequestError } from '@/lib/api/client';
import { designKeys, VERSION_STALE_MS } from '@/lib/api/designs';
import { useSessionPending } from '@/lib/api/session-gate';

/** Versions are immutable, so their queries never go stale; saving one refreshes its design. */
export function useVersion(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.version(id, n),
    queryFn: () => api.get<VersionResponse>(`/api/designs/${id}/versions/${n}`),
    select: (data) => data.version,
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

export function useVersionReport(id: number, n: number) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.report(id, n),
    queryFn: () => api.get<ReportResponse>(`/api/designs/${id}/versions/${n}/report`),
    staleTime: VERSION_STALE_MS,
    enabled: !pending,
  });
}

/**
 * The report screen's data in one request (design, version with its document, report). The version
 * and its report also go into their own caches, so the version screen opened next asks for nothing.
 */
export function useReportPage(id: number, n: number) {
  const pending = useSessionPending();
  const queryClient = useQueryClient();
  return useQuery({
    queryKey: designKeys.reportPage(id, n),
    queryFn: async () => {
      const page = await api.get<ReportPageResponse>(`/api/designs/${id}/versions/${n}/report-page`);
      queryClient.setQueryData<VersionResponse>(designKeys.version(id, n), { version: page.version });
      queryClient.setQueryData<ReportResponse>(designKeys.report(id, n), { report: page.report, summary: page.summary });
      return page;
    },
    staleTime: VERSION_STALE_MS,
    enabled: !pending,
  });
}

/** For each unit not owned by one host, what taking it down cuts off and leaves exposed (stored with the version). */
export function useVersionAfterOne(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.afterOne(id, n),
    queryFn: () => api.get<AfterOneResponse>(`/api/designs/${id}/versions/${n}/after-one`),
    select: (data) => data.afterOneFailure,
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

/** What changed going from version `from` to version `to` (the route reads `/versions/:to/diff?against=from`). */
export function useVersionDiff(id: number, from: number, to: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: designKeys.diff(id, from, to),
    queryFn: () => api.get<DiffResponse>(`/api/designs/${id}/versions/${to}/diff?against=${from}`),
    select: (data) => data.diff,
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

function useDesignMutation<TVars>(id: number, mutationFn: (vars: TVars) => Promise<SaveVersionResponse>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    // The design's versions, status and its row in the list all move with a new version.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: designKeys.design(id), exact: true }),
        queryClient.invalidateQueries({ queryKey: designKeys.lists() }),
      ]),
    // A 409 means someone else saved first: fetch the versions again so the screen shows theirs.
    onError: (error) => {
      if (isApiRequestError(error) && error.status === 409) void queryClient.invalidateQueries({ queryKey: designKeys.design(id), exact: true });
    },
  });
}

export function useSaveVersion(id: number) {
  return useDesignMutation(id, (body: SaveVersionBody) => api.post<SaveVersionResponse>(`/api/designs/${id}/versions`, body));
}

export function useRestoreVersion(id: number) {
  return useDesignMutation(id, ({ n, ...body }: RestoreBody & { n: number }) =>
    api.post<SaveVersionResponse>(`/api/designs/${id}/versions/${n}/restore`, body),
  );
}

/** Load one version on demand (a download), through the same cache the version screen uses. */
export function useVersionLoader(id: number) {
  const queryClient = useQueryClient();
  return (n: number) =>
    queryClient
      .fetchQuery({
        queryKey: designKeys.version(id, n),
        queryFn: () => api.get<VersionResponse>(`/api/designs/${id}/versions/${n}`),
        staleTime: VERSION_STALE_MS,
      })
      .then((data) => data.version);
}

import { onlineManager, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useEffect, useSyncExternalStore } from 'react';
import { useStore } from 'zustand';
import type { BuildResponse, ChecklistResponse, HistoryResponse, MarkBody, MarkResponse, PhotoResponse, StepBody, StepMarkResponse } from '@/shared/api/build';
import { api } from '@/lib/api/client';
import { designKeys, VERSION_STALE_MS } from '@/lib/api/designs';
import { useMe } from '@/lib/api/auth';
import { useSessionPending } from '@/lib/api/session-gate';
import { withPending, type ShownRecord } from '@/lib/build/pending';
import { createBuildQueue, defaultQueueStorage, requestOf, type BuildQueue, type BuildQueueState, type FlushReport, type QueuedItem } from '@/lib/build/queue';

/**
 * The site-work routes (docs/api.md) for the phone screens: the build record and its history as
 * queries, marks through the offline queue (lib/build/queue.ts) or straight to the server, photos
 * straight to the server. The build record hangs under its version's key, so anything that
 * refreshes a design refreshes its build records too.
 */
export const buildKeys = {
  record: (id: number, n: number) => [...designKeys.version(id, n), 'build'] as const,
  history: (id: number, n: number) => [...buildKeys.record(id, n), 'history'] as const,
  checklist: (id: number, n: number) => [...designKeys.version(id, n), 'checklist'] as const,
};

/** Teammates mark cables while someone watches: the record is looked at again every half minute. */
export const BUILD_STALE_MS = 15_000;
export const BUILD_REFETCH_MS = 30_000;

export const photoUrl = (photoId: string) => `/api/photos/${encodeURIComponent(photoId)}`;

export function useBuild(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: buildKeys.record(id, n),
    queryFn: () => api.get<BuildResponse>(`/api/designs/${id}/versions/${n}/build`),
    select: (data) => data.build,
    staleTime: BUILD_STALE_MS,
    refetchInterval: BUILD_REFETCH_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

/** The version's bring-up checklist: it never changes, so it is fetched once and kept. */
export function useChecklist(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: buildKeys.checklist(id, n),
    queryFn: () => api.get<ChecklistResponse>(`/api/designs/${id}/versions/${n}/build/checklist`),
    select: (data) => data.checklist,
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

export function useBuildHistory(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: buildKeys.history(id, n),
    queryFn: () => api.get<HistoryResponse>(`/api/designs/${id}/versions/${n}/build/history`),
    select: (data) => data.marks,
    staleTime: BUILD_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

function refreshBuild(queryClient: QueryClient, id: number, n: number) {
  return queryClient.invalidateQueries({ queryKey: buildKeys.record(id, n) });
}

/** A cable mark sent at once (a desk with a steady connection); the phone screens use the queue. */
export function useMarkCable(id: number, n: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MarkBody) => api.post<MarkResponse>(`/api/designs/${id}/versions/${n}/build/marks`, body),
    onSuccess: () => refreshBuild(queryClient, id, n),
  });
}

export function useMarkStep(id: number, n: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: StepBody) => api.post<StepMarkResponse>(`/api/designs/${id}/versions/${n}/build/steps`, body),
    onSuccess: () => refreshBuild(queryClient, id, n),
  });
}

/** A photo of a cable or a rack: `file` is a Blob (web: the camera's or the file picker's File). */
export type PhotoUpload = { file: Blob; fileName?: string } & ({ cableId: string; rackId?: never } | { rackId: string; cableId?: never });

export function useUploadPhoto(id: number, n: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: PhotoUpload) => {
      const form = new FormData();
      if (upload.cableId !== undefined) form.append('cableId', upload.cableId);
      if (upload.rackId !== undefined) form.append('rackId', upload.rackId);
      form.append('photo', upload.file, upload.fileName ?? 'photo');
      return api.upload<PhotoResponse>(`/api/designs/${id}/versions/${n}/build/photos`, form);
    },
    onSuccess: () => refreshBuild(queryClient, id, n),
  });
}

/** The app's one queue, kept in localStorage on the web. */
export const buildQueue: BuildQueue = createBuildQueue({ storage: defaultQueueStorage() });

export function useBuildQueue<T>(selector: (state: BuildQueueState) => T, queue: BuildQueue = buildQueue): T {
  return useStore(queue, selector);
}

/** Send one queued item through the API client (an ApiRequestError carries the status the queue classifies). */
export async function sendQueued(item: QueuedItem): Promise<void> {
  const { path, body } = requestOf(item);
  await api.post(path, body);
}

export const QUEUE_RETRY_MS = 20_000;

/** Send this account's waiting items now; afterwards the build records of the versions that received marks are fetched again. */
export async function flushQueue(queue: BuildQueue, queryClient: QueryClient, userId: number): Promise<FlushReport> {
  const versions = new Map(queue.getState().items.map((i) => [`${i.designId}/${i.version}`, [i.designId, i.version] as const]));
  const report: FlushReport = await queue.getState().flush(sendQueued, userId);
  if (report.sent.length + report.refused.length > 0) {
    await Promise.all([...versions.values()].map(([id, n]) => refreshBuild(queryClient, id, n)));
  }
  return report;
}

/** "Send now" and "Retry": a flush asked for by the installer, even when the browser believes it is offline. */
export function useSendNow(queue: BuildQueue = buildQueue): (() => Promise<FlushReport | null>) | null {
  const queryClient = useQueryClient();
  const userId = useMe().data?.id ?? null;
  if (userId === null) return null;
  return () => flushQueue(queue, queryClient, userId);
}

/**
 * Keep the queue moving while a screen that marks is open: flush now, whenever the browser comes
 * back online (React Query's onlineManager), and every 20 s while items wait; after each flush the
 * build records of the versions that received marks are fetched again.
 */
export function useQueueSender(queue: BuildQueue = buildQueue): void {
  const queryClient = useQueryClient();
  const userId = useMe().data?.id ?? null;
  useEffect(() => {
    if (userId === null) return;
    let stopped = false;
    const flush = async () => {
      if (stopped || !onlineManager.isOnline()) return;
      await flushQueue(queue, queryClient, userId);
    };
    void flush();
    const unsubscribe = onlineManager.subscribe((online) => {
      if (online) void flush();
    });
    const timer = setInterval(() => {
      if (queue.getState().items.some((i) => i.status === 'waiting' && i.userId === userId)) void flush();
    }, QUEUE_RETRY_MS);
    // A mark queued while online goes out at once.
    const unwatch = queue.subscribe((state, before) => {
      if (state.items.length > before.items.length) void flush();
    });
    return () => {
      stopped = true;
      unsubscribe();
      unwatch();
      clearInterval(timer);
    };
  }, [queue, queryClient, userId]);
}

/**
 * The build record as the phone shows it: the server's record with this account's queued marks laid
 * over it, each flagged waiting (or refused). Undefined until the record has loaded.
 */
export function useShownBuild(id: number, n: number, queue: BuildQueue = buildQueue): { shown: ShownRecord | undefined; query: ReturnType<typeof useBuild> } {
  const query = useBuild(id, n);
  const me = useMe().data;
  const items = useBuildQueue((s) => s.items, queue);
  const mine = me ? items.filter((i) => i.userId === me.id) : [];
  const shown = query.data && me ? withPending(query.data, mine, { id: me.id, name: me.name }) : undefined;
  return { shown, query };
}

/** Whether the browser has a connection, as React Query's onlineManager sees it (it follows the online and offline events). */
export function useOnline(): boolean {
  return useSyncExternalStore(
    (listener) => onlineManager.subscribe(listener),
    () => onlineManager.isOnline(),
    () => true,
  );
}

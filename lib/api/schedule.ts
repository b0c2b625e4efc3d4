import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api/client';
import { designKeys, VERSION_STALE_MS } from '@/lib/api/designs';
import { useSessionPending } from '@/lib/api/session-gate';
import type { CableSchedule, ScheduleRow } from '@/shared/schedule/types';

/**
 * The build sheet of one version (docs/api.md): the cable schedule as JSON, and the paths of the files
 * the server makes from it. A version never changes, so neither does its schedule.
 */
export const scheduleKeys = {
  cables: (id: number, n: number) => [...designKeys.version(id, n), 'cables'] as const,
};

export type BuildSheetFile = 'cables.csv' | 'addresses.csv' | 'cables.xlsx';

export function buildSheetPath(id: number, n: number, file: BuildSheetFile): string {
  return `/api/designs/${id}/versions/${n}/${file}`;
}

export function useCableSchedule(id: number, n: number, options: { enabled?: boolean } = {}) {
  const pending = useSessionPending();
  return useQuery({
    queryKey: scheduleKeys.cables(id, n),
    queryFn: () => api.get<CableSchedule>(`/api/designs/${id}/versions/${n}/cables`),
    staleTime: VERSION_STALE_MS,
    enabled: !pending && (options.enabled ?? true),
  });
}

/** One row of the schedule, found in the same cached answer the schedule screen uses. */
export function useScheduleRow(id: number, n: number, cableId: string) {
  const query = useCableSchedule(id, n);
  const row: ScheduleRow | null = query.data ? (query.data.cables.find((c) => c.id === cableId) ?? null) : null;
  return { query, row };
}

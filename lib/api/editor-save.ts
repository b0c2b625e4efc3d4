import type { QueryClient } from '@tanstack/react-query';
import type { VersionResponse } from '@/shared/api/designs';
import type { Topology } from '@/shared/topology/schema';
import { api } from '@/lib/api/client';
import { designKeys, VERSION_STALE_MS } from '@/lib/api/designs';

/**
 * The editor's one imperative read: the document of a version, through the same cache entry
 * useVersion fills (a version never changes, so a cached one is as good as a fresh one). Used when
 * the designer chooses to open a teammate's newer version after a save conflict.
 */
export async function fetchVersionDocument(client: QueryClient, designId: number, n: number): Promise<Topology> {
  const data = await client.fetchQuery({
    queryKey: designKeys.version(designId, n),
    queryFn: () => api.get<VersionResponse>(`/api/designs/${designId}/versions/${n}`),
    staleTime: VERSION_STALE_MS,
  });
  return data.version.document;
}

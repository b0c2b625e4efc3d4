import type { Topology } from '@/shared/topology/schema';
import { harborV2 } from './designs';

/**
 * The Harbor Road document with one device's id (and name) replaced by `id`, everywhere it is
 * referenced as a whole string (the layout key included). Ids that are also names of properties
 * every JavaScript object has (`constructor`, `__proto__`, `toString`) are valid ids; the server
 * must treat them as any other.
 */
export function withDeviceId(deviceId: 'vault-1' | 'fab-a' | 'fab-b', id: string): Topology {
  return JSON.parse(JSON.stringify(harborV2()).split(`"${deviceId}"`).join(JSON.stringify(id))) as Topology;
}

/** Wait until `check()` holds (polling every few milliseconds), or give up after `ms`. */
export async function until(check: () => boolean, ms = 20_000): Promise<boolean> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (check()) return true;
    await new Promise((resolve) => setTimeout(resolve, 5));
  }
  return check();
}

import { directAttach } from '@/shared/patterns/direct';
import { buildFabric } from '@/shared/patterns/fabric';
import type { FabricOptions, ManagedFabricOptions } from '@/shared/patterns/options';
import type { Topology } from '@/shared/topology/schema';

/**
 * Pattern starters: pure functions that return a complete, valid topology document with canvas
 * positions. The same options always give the same document, ids included.
 */
export { directAttach };
export type { FabricOptions, ManagedFabricOptions, NetworkPlan, PatternOptions } from '@/shared/patterns/options';

/** Two data switches, one subnet each; data ports only. */
export function dualFabric(options: FabricOptions = {}): Topology {
  return buildFabric({ name: 'Dual fabric', ...options }, false);
}

/** Dual fabric plus management ports on a separate management switch and network. */
export function dualFabricWithManagement(options: ManagedFabricOptions = {}): Topology {
  return buildFabric({ name: 'Dual fabric with management', ...options }, true);
}

export const PATTERNS = [
  { id: 'direct-attach', name: 'Direct attach', build: directAttach },
  { id: 'dual-fabric', name: 'Dual fabric', build: dualFabric },
  { id: 'dual-fabric-management', name: 'Dual fabric with management network', build: dualFabricWithManagement },
] as const;

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

/** One name and one sentence per pattern, used by every screen that offers them. */
export const PATTERNS = [
  { id: 'direct-attach', name: 'Direct attach', about: 'No switches: each host card is cabled straight to a controller, every cable on a subnet of its own.', build: directAttach },
  { id: 'dual-fabric', name: 'Dual fabric', about: 'Two data switches, one subnet each; every host has one storage port on each, on different cards.', build: dualFabric },
  { id: 'dual-fabric-management', name: 'Dual fabric with management', about: 'Dual fabric, plus management ports on a separate management switch and network.', build: dualFabricWithManagement },
] as const;

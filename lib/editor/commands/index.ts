import type { Topology } from '@/shared/topology/schema';
import { addressingCommands } from '@/lib/editor/commands/addressing';
import { assignNetworkCommands } from '@/lib/editor/commands/assign-network';
import { cablingCommands } from '@/lib/editor/commands/cabling';
import type { CommandDef } from '@/lib/editor/commands/define';
import type * as Fns from '@/lib/editor/commands/functions';
import { deviceCommands } from '@/lib/editor/commands/devices';
import { layoutCommands } from '@/lib/editor/commands/layout';
import { networkCommands } from '@/lib/editor/commands/networks';
import { patternCommands } from '@/lib/editor/commands/patterns';
import { portCommands } from '@/lib/editor/commands/ports';
import { powerCommands } from '@/lib/editor/commands/power';
import { selectionCommands } from '@/lib/editor/commands/selection';
import { CommandError, commandErrorFromZod } from '@/lib/editor/errors';

/**
 * The command registry: every edit by name. The store, keyboard shortcuts and tests run edits
 * through `runCommand(doc, name, args)`, which checks the arguments with the command's zod schema
 * first, so a bad call from anywhere becomes a CommandError with a field path, never a broken
 * document. Each command is also exported as a plain typed function for direct use.
 */
const ALL = [...deviceCommands, ...portCommands, ...cablingCommands, ...networkCommands, ...addressingCommands, ...layoutCommands, ...patternCommands, ...selectionCommands, ...assignNetworkCommands, ...powerCommands] as const;

// `command()` widens names to string; the plain functions' names restore them for typed calls.
type ArgsOf<F> = F extends (doc: Topology, args: infer A) => Topology ? A : never;
export type CommandArgs = { [K in keyof typeof Fns]: ArgsOf<(typeof Fns)[K]> };
export type CommandName = keyof CommandArgs;

export const COMMANDS: ReadonlyMap<string, CommandDef<unknown>> = new Map(ALL.map((def) => [def.name, def as CommandDef<unknown>]));

export const COMMAND_NAMES = ALL.map((def) => def.name);

export function runCommand<K extends keyof CommandArgs>(doc: Topology, name: K, args: CommandArgs[K]): Topology;
export function runCommand(doc: Topology, name: string, args: unknown): Topology;
export function runCommand(doc: Topology, name: string, args: unknown): Topology {
  const def = COMMANDS.get(name);
  if (!def) throw new CommandError('unknown-command', `There is no command "${name}".`);
  const parsed = def.args.safeParse(args ?? {});
  if (!parsed.success) throw commandErrorFromZod(parsed.error.issues);
  return def.run(doc, parsed.data);
}

export * from '@/lib/editor/commands/functions';
export type { CommandDef } from '@/lib/editor/commands/define';
export { plannedDeviceId, type AddDeviceArgs, type RenameArgs, type SetDeviceArgs } from '@/lib/editor/commands/devices';
export type { AddAdapterArgs, AddControllerArgs, AddPortArgs, SetPortArgs } from '@/lib/editor/commands/ports';
export { plannedCable, suggestMedia, type CablePortsArgs, type SetCableArgs } from '@/lib/editor/commands/cabling';
export { plannedNetworkId, type AddNetworkArgs, type UpdateNetworkArgs } from '@/lib/editor/commands/networks';
export { planAddresses, type AutoAssignArgs } from '@/lib/editor/commands/addressing';
export type { AssignNetworkArgs } from '@/lib/editor/commands/assign-network';
export { freeSpot, type MoveDeviceArgs, type MoveDevicesArgs } from '@/lib/editor/commands/layout';
export { PATTERN_IDS, type ApplyPatternArgs, type PatternId } from '@/lib/editor/commands/patterns';

import type { z } from 'zod';
import type { Topology } from '@/shared/topology/schema';

/**
 * One named edit: a zod schema for its arguments (checked when a command is run by name, from a
 * keyboard shortcut or the store) and a pure function that returns the next document. Schemas
 * carry no defaults or transforms, so the type a caller passes is the type the function gets.
 */
export type CommandDef<A> = {
  name: string;
  summary: string;
  args: z.ZodType<A>;
  run: (doc: Topology, args: A) => Topology;
};

export function command<A>(name: string, summary: string, args: z.ZodType<A>, run: (doc: Topology, args: A) => Topology): CommandDef<A> {
  return { name, summary, args, run };
}

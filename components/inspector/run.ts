import type { CommandArgs, CommandName } from '@/lib/editor/commands';
import { editorStore } from '@/lib/editor/store';

/** Runs a command on the editor's document; the refusal's sentence, or null when it ran. */
export function runEdit<K extends CommandName>(name: K, args: CommandArgs[K]): string | null {
  const result = editorStore.getState().run(name, args);
  return result.ok ? null : result.error.message;
}

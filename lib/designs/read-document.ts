import type { Issue } from '@/shared/api/common';
import { validateTopology } from '@/shared/topology/validate';
import type { Topology } from '@/shared/topology/schema';

export type ImportResult =
  | { ok: true; fileName: string; doc: Topology }
  | { ok: false; fileName: string; issues: Issue[] };

/** A file's text as a topology document, with every problem and its path when it is not one. */
export function readTopologyText(fileName: string, text: string): ImportResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    const reason = error instanceof Error ? error.message : 'unreadable';
    return { ok: false, fileName, issues: [{ path: '', message: `${fileName} is not a JSON file (${reason}).` }] };
  }
  const checked = validateTopology(value);
  return checked.ok ? { ok: true, fileName, doc: checked.doc } : { ok: false, fileName, issues: checked.issues };
}

import * as DocumentPicker from 'expo-document-picker';
import type { Issue } from '@/shared/api/common';
import { validateTopology } from '@/shared/topology/validate';
import type { Topology } from '@/shared/topology/schema';

/** The server takes documents up to 10 MB (api.md, 413 beyond); say so before uploading anything larger. */
export const MAX_DOCUMENT_BYTES = 10 * 1024 * 1024;

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

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/**
 * Ask for a topology JSON file and check it. Null when the person closed the picker. On the web the
 * picker hands over the File itself, which is read here; nothing is sent anywhere.
 */
export async function pickTopologyFile(): Promise<ImportResult | null> {
  const picked = await DocumentPicker.getDocumentAsync({ type: ['application/json', '.json'], multiple: false });
  if (picked.canceled || !picked.assets?.[0]) return null;
  const asset = picked.assets[0];
  const fileName = asset.name || 'the file';
  if (typeof asset.size === 'number' && asset.size > MAX_DOCUMENT_BYTES) {
    return { ok: false, fileName, issues: [{ path: '', message: `${fileName} is ${megabytes(asset.size)}; a document can be at most ${megabytes(MAX_DOCUMENT_BYTES)}.` }] };
  }
  if (!asset.file) return { ok: false, fileName, issues: [{ path: '', message: `${fileName} could not be read in this browser.` }] };
  return readTopologyText(fileName, await asset.file.text());
}

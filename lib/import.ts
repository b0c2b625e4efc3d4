import * as DocumentPicker from 'expo-document-picker';
import { readTopologyText, type ImportResult } from '@/lib/designs/read-document';

export { readTopologyText, type ImportResult } from '@/lib/designs/read-document';

/** The server takes documents up to 10 MB (docs/api.md, 413 beyond); say so before uploading anything larger. */
export const MAX_DOCUMENT_BYTES = 10 * 1024 * 1024;

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

import { Platform } from 'react-native';
import { jsonFileText } from '@/lib/designs/files';

export { jsonFileText, versionFileName } from '@/lib/designs/files';

/** Hand a JSON file to the browser's download; returns false where there is no browser to do it. */
export function downloadJson(fileName: string, value: unknown): boolean {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return false;
  return downloadBlob(fileName, new Blob([jsonFileText(value)], { type: 'application/json' }));
}

/** Hand any file (a CSV or workbook from the server) to the browser's download; false where there is no browser. */
export function downloadBlob(fileName: string, blob: Blob): boolean {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return false;
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoke on the next turn: some browsers start the download only after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 0);
  return true;
}

import { Platform } from 'react-native';

/**
 * "Harbor Road storage", 2 → "harbor-road-storage-v2.json": a file name that survives every file
 * system and still says which design and version it holds.
 */
export function versionFileName(designName: string, number: number): string {
  const slug = designName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80);
  return `${slug || 'design'}-v${number}.json`;
}

/** The document as the file holds it: indented, so it reads well in an editor and diffs line by line. */
export function jsonFileText(value: unknown): string {
  return `${JSON.stringify(value, null, 2)}\n`;
}

/** Hand a JSON file to the browser's download; returns false where there is no browser to do it. */
export function downloadJson(fileName: string, value: unknown): boolean {
  if (Platform.OS !== 'web' || typeof document === 'undefined') return false;
  const blob = new Blob([jsonFileText(value)], { type: 'application/json' });
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

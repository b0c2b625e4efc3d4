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

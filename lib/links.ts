/** Pieces of plain text, with web addresses marked so they can be shown as links. */
export type TextPiece = { kind: 'text'; text: string } | { kind: 'link'; text: string; url: string };

// Stops at whitespace and at characters that usually close a sentence or a bracket around the address.
const URL_PATTERN = /https?:\/\/[^\s<>"'`]+[^\s<>"'`.,;:!?)\]]/g;

export function splitLinks(text: string): TextPiece[] {
  const pieces: TextPiece[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    if (start > last) pieces.push({ kind: 'text', text: text.slice(last, start) });
    pieces.push({ kind: 'link', text: match[0], url: match[0] });
    last = start + match[0].length;
  }
  if (last < text.length) pieces.push({ kind: 'text', text: text.slice(last) });
  return pieces;
}

/** The in-app path of a URL on this app's own origin (so the router opens it), otherwise null. */
export function inAppPath(url: string, origin: string | null): string | null {
  if (!origin) return null;
  try {
    const parsed = new URL(url);
    if (parsed.origin !== origin) return null;
    return parsed.pathname + parsed.search + parsed.hash;
  } catch {
    return null;
  }
}

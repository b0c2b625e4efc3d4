/**
 * Names and labels with the characters that change how the text around them is shown taken out,
 * for every name a person types (devices, parts, cables, networks, documents, users, designs).
 *
 * - Control characters (Unicode general category Cc: U+0000–U+001F, U+007F–U+009F). Those that
 *   break a line or space words (tab, line feed, vertical tab, form feed, carriage return, next
 *   line) become one space, as do the line and paragraph separators U+2028 and U+2029, so
 *   "Harbor↵Road" reads "Harbor Road"; the others are removed.
 * - The bidirectional formatting characters, the Bidi_Control property of Unicode Standard Annex
 *   #9 (U+061C, U+200E, U+200F, U+202A–U+202E, U+2066–U+2069): an override such as U+202E shows
 *   the text after it reversed, so a name could read as something else on screen, in a report or
 *   on a printed label (the "Trojan Source" attack, CVE-2021-42574).
 * - The deprecated format characters U+206A–U+206F and the interlinear annotation characters
 *   U+FFF9–U+FFFB, which hide or rearrange text in the same way.
 *
 * Joiners (U+200C, U+200D) stay: scripts and emoji sequences need them. Text that holds none of
 * these characters comes back as the same string.
 */
const SPACING = /[\t\n\v\f\r\u0085\u2028\u2029]/g;
const REMOVED = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069\u206a-\u206f\ufff9-\ufffb]/g;
const ANY = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u206f\ufff9-\ufffb]/;

export function isCleanText(text: string): boolean {
  return !ANY.test(text);
}

export function cleanText(text: string): string {
  if (isCleanText(text)) return text;
  return text.replace(SPACING, ' ').replace(REMOVED, '');
}

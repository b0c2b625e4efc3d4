import { LIMITS } from '@/shared/rules/limits';

/**
 * iSCSI names (RFC 7143 §4.2.7; RFC 3720 §3.2.6). Three forms:
 *   iqn.YYYY-MM.reversed.domain[:unique]   (§4.2.7.4)
 *   eui.<16 hex digits>                    (§4.2.7.5)
 *   naa.<16 or 32 hex digits>              (§4.2.7.6; RFC 3980 §4.1)
 * A name is prepared by the iSCSI stringprep profile (RFC 3722) before it is compared or checked:
 * code points of stringprep table B.1 map to nothing, case folds to lowercase (the RFCs' own examples
 * use uppercase hex), then NFKC. The prepared name is at most 223 bytes of UTF-8 and has no
 * prohibited output (RFC 3722 §6): of ASCII only letters, digits, "-", "." and ":"; no spaces,
 * control or format characters, private-use, unassigned or non-character code points, and not the
 * ideographic full stop. Not checked: stringprep's bidirectional-text rule (RFC 3454 §6).
 * The naming authority of an iqn name is a reversed DNS domain, so its labels are ASCII
 * letters, digits and inner hyphens.
 */
export type IscsiNameCheck = { ok: true; form: 'iqn' | 'eui' | 'naa'; folded: string } | { ok: false; reason: string };

const PRINTABLE_ASCII = /^[\x20-\x7e]*$/;

/** Stringprep table B.1: soft hyphen, joiners, variation selectors and the like map to nothing. */
const MAPPED_TO_NOTHING = /[\u00AD\u034F\u1806\u180B-\u180D\u200B-\u200D\u2060\uFE00-\uFE0F\uFEFF]/gu;

/**
 * The name as RFC 3722 prepares it. toLowerCase stands in for table B.2's case folding, with the
 * one full fold it leaves out that a name might hold (ß → ss).
 */
export function foldIscsiName(name: string): string {
  // Printable ASCII, as nearly every name is: case folding is all the preparation it needs.
  if (PRINTABLE_ASCII.test(name)) return name.toLowerCase();
  return name.replace(MAPPED_TO_NOTHING, '').toLowerCase().replace(/ß/g, 'ss').normalize('NFKC').toLowerCase();
}

const ASCII_ALLOWED = /[a-z0-9.:-]/;
// RFC 3722 §6 via stringprep tables C.1.2–C.9, by Unicode category where the tables follow one.
const PROHIBITED = /[\p{Z}\p{Cc}\p{Cf}\p{Co}\p{Cs}\p{Cn}\uFFFC\uFFFD\u2FF0-\u2FFB\u3002\uFDD0-\uFDEF]/u;

function describeCharacter(ch: string): string {
  if (ch === ' ') return 'a space';
  const code = ch.codePointAt(0)!;
  if (code < 0x20 || code === 0x7f || PROHIBITED.test(ch)) return `the character U+${code.toString(16).toUpperCase().padStart(4, '0')}`;
  return `"${ch}"`;
}

const ALL_ASCII_ALLOWED = /^[a-z0-9.:-]*$/;

/** Every distinct character the prepared name may not hold, in order of first appearance. */
function prohibitedCharacters(folded: string): string[] {
  if (ALL_ASCII_ALLOWED.test(folded)) return []; // nearly every name: no walk over its characters
  const bad: string[] = [];
  for (const ch of folded) {
    const ascii = ch.charCodeAt(0) < 0x80;
    if ((ascii ? !ASCII_ALLOWED.test(ch) : PROHIBITED.test(ch)) && !bad.includes(ch)) bad.push(ch);
  }
  return bad;
}

/** "a space", "a space and "_"", "a space, "_" and "/"". */
function listCharacters(chars: string[]): string {
  const words = chars.map(describeCharacter);
  return words.length < 2 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

const IQN = /^iqn\.(\d{4})-(\d{2})\.([^:]*)(?::(.*))?$/su;
const DOMAIN_LABEL = /^[a-z0-9](?:[a-z0-9-]*[a-z0-9])?$/;

function checkIqn(folded: string): string | null {
  if (/^iqn\.\d{4}-\d{2}\.?$/.test(folded)) return 'the naming authority, a reversed domain such as com.example, is missing after the date';
  const match = IQN.exec(folded);
  if (!match) return 'an iqn name starts iqn.YYYY-MM. with the year and month its naming authority held the domain';
  if (Number(match[1]) === 0) return 'the year "0000" is not a year in which anyone held the domain';
  const month = Number(match[2]);
  if (month < 1 || month > 12) return `the month "${match[2]}" is not 01–12`;
  const authority = match[3];
  if (authority === '' || !authority.split('.').every((label) => DOMAIN_LABEL.test(label))) {
    return `the naming authority "${authority}" is not a reversed domain name such as com.example`;
  }
  if (match[4] === '') return 'nothing follows the ":"; leave it out or add the unique part';
  return null;
}

export function checkIscsiName(name: string): IscsiNameCheck {
  const folded = foldIscsiName(name);
  const bytes = PRINTABLE_ASCII.test(folded) ? folded.length : new TextEncoder().encode(folded).length;
  if (bytes > LIMITS.iscsiNameMaxBytes.value) {
    return { ok: false, reason: `it is ${bytes} bytes long; the limit is ${LIMITS.iscsiNameMaxBytes.value}` };
  }
  const bad = prohibitedCharacters(folded);
  if (bad.length > 0) {
    const punctuation = bad.some((ch) => ch.charCodeAt(0) < 0x80 && ch !== ' ' && ch.charCodeAt(0) >= 0x20);
    const hint = punctuation ? ' (of punctuation only "-", "." and ":")' : '';
    return { ok: false, reason: `it contains ${listCharacters(bad)}, which iSCSI names do not allow${hint}` };
  }
  const form = folded.slice(0, 4);
  if (form !== 'iqn.' && form !== 'eui.' && form !== 'naa.') return { ok: false, reason: 'it must start with "iqn.", "eui." or "naa."' };
  if (form === 'iqn.') {
    const reason = checkIqn(folded);
    return reason ? { ok: false, reason } : { ok: true, form: 'iqn', folded };
  }
  if (form === 'eui.') {
    return /^eui\.[0-9a-f]{16}$/.test(folded)
      ? { ok: true, form: 'eui', folded }
      : { ok: false, reason: 'an eui name is "eui." and 16 hexadecimal digits' };
  }
  return /^naa\.(?:[0-9a-f]{16}|[0-9a-f]{32})$/.test(folded)
    ? { ok: true, form: 'naa', folded }
    : { ok: false, reason: 'a naa name is "naa." and 16 or 32 hexadecimal digits' };
}

/** A well-formed initiator name for a host, e.g. iqn.2026-01.example.tidewater:wms-db-1. */
export function makeIqn(yearMonth: string, domain: string, unique: string): string {
  const reversed = domain.split('.').reverse().join('.');
  return foldIscsiName(`iqn.${yearMonth}.${reversed}:${unique}`);
}

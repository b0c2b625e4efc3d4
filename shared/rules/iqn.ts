import { LIMITS } from '@/shared/rules/limits';

/**
 * iSCSI names (RFC 7143 §4.2.7; RFC 3720 §3.2.6). Three forms:
 *   iqn.YYYY-MM.reversed.domain[:unique]   (§4.2.7.4)
 *   eui.<16 hex digits>                    (§4.2.7.5)
 *   naa.<16 or 32 hex digits>              (§4.2.7.6; RFC 3980 §4.1)
 * Names compare after case folding (RFC 3722 stringprep; the RFCs' own examples use uppercase hex),
 * are at most 223 bytes of UTF-8, and use only `-`, `.` and `:` as punctuation.
 */
export type IscsiNameCheck = { ok: true; form: 'iqn' | 'eui' | 'naa'; folded: string } | { ok: false; reason: string };

/** Case folding and compatibility normalisation: the parts of the iSCSI stringprep profile that matter here. */
export function foldIscsiName(name: string): string {
  return name.normalize('NFKC').toLowerCase();
}

const LABEL = '[a-z0-9](?:[a-z0-9-]*[a-z0-9])?';
const IQN = new RegExp(`^iqn\\.(\\d{4})-(\\d{2})\\.(${LABEL}(?:\\.${LABEL})*)(?::(.*))?$`, 'u');
// After folding: lowercase letters of any script, digits, and the three separators.
const UNIQUE_PART = /^[\p{Ll}\p{Lo}\p{Nd}.:-]+$/u;

function checkIqn(folded: string): string | null {
  const match = IQN.exec(folded);
  if (!match) return 'an iqn name is iqn.YYYY-MM.reversed.domain, optionally followed by ":" and a unique part';
  const month = Number(match[2]);
  if (month < 1 || month > 12) return `the month "${match[2]}" is not 01–12`;
  const unique = match[4];
  if (unique !== undefined && !UNIQUE_PART.test(unique)) {
    return 'the part after ":" may use only letters, digits, "-", "." and ":"';
  }
  return null;
}

export function checkIscsiName(name: string): IscsiNameCheck {
  if (name.trim() !== name) return { ok: false, reason: 'it has spaces at its start or end' };
  const folded = foldIscsiName(name);
  const bytes = new TextEncoder().encode(folded).length;
  if (bytes > LIMITS.iscsiNameMaxBytes.value) {
    return { ok: false, reason: `it is ${bytes} bytes long; the limit is ${LIMITS.iscsiNameMaxBytes.value}` };
  }
  if (folded.startsWith('iqn.')) {
    const reason = checkIqn(folded);
    return reason ? { ok: false, reason } : { ok: true, form: 'iqn', folded };
  }
  if (folded.startsWith('eui.')) {
    return /^eui\.[0-9a-f]{16}$/.test(folded)
      ? { ok: true, form: 'eui', folded }
      : { ok: false, reason: 'an eui name is "eui." and 16 hexadecimal digits' };
  }
  if (folded.startsWith('naa.')) {
    return /^naa\.(?:[0-9a-f]{16}|[0-9a-f]{32})$/.test(folded)
      ? { ok: true, form: 'naa', folded }
      : { ok: false, reason: 'a naa name is "naa." and 16 or 32 hexadecimal digits' };
  }
  return { ok: false, reason: 'it must start with "iqn.", "eui." or "naa."' };
}

/** A well-formed initiator name for a host, e.g. iqn.2026-01.example.tidewater:wms-db-1. */
export function makeIqn(yearMonth: string, domain: string, unique: string): string {
  const reversed = domain.split('.').reverse().join('.');
  return foldIscsiName(`iqn.${yearMonth}.${reversed}:${unique}`);
}

import { z } from 'zod';
import { isValidCidr } from '@/shared/address/cidr';
import { isValidIp } from '@/shared/address/ip';
import { checkIscsiName } from '@/shared/rules/iqn';

/**
 * The inspector's and networks screen's fields: what a person types, checked with zod before any
 * command runs, with one plain sentence when it cannot be used. Empty text means "none" where the
 * format makes the field optional. Range problems the format allows in a draft (a VLAN of 5000, an
 * MTU of 100) are not refused here: they are saved and the analysis reports them beside the field.
 */
export type FieldResult<T> = { ok: true; value: T } | { ok: false; message: string };

export function parseField<T>(schema: z.ZodType<T>, text: string): FieldResult<T> {
  const result = schema.safeParse(text);
  if (result.success) return { ok: true, value: result.data };
  return { ok: false, message: result.error.issues[0]?.message ?? 'This value cannot be used.' };
}

const trimmed = z.string().transform((s) => s.trim());

export const nameField = trimmed.pipe(z.string().min(1, 'Give it a name.').max(200, 'Use at most 200 characters.'));

/**
 * Empty removes the initiator name. Anything else is kept, even a name iSCSI would refuse: a draft
 * must always be savable, and the analysis reports it (iqn-invalid), naming what is wrong.
 */
export const iqnField = trimmed.pipe(z.string().max(1000, 'Use at most 1000 characters.')).transform((s) => (s === '' ? null : s));

/** What is wrong with a typed initiator name, in the analysis rule's words (RFC 7143 §4.2.7); null when nothing is. */
export function iqnAdvice(text: string): string | null {
  const value = text.trim();
  if (value === '') return null;
  const check = checkIscsiName(value);
  return check.ok ? null : `Not a valid iSCSI name: ${check.reason}.`;
}

export const rackField = trimmed.pipe(z.string().max(100, 'Use at most 100 characters.')).transform((s) => (s === '' ? null : s));

const wholeNumber = (min: number, max: number, what: string) =>
  trimmed.pipe(
    z
      .string()
      .regex(/^-?\d*$/, `Enter ${what} as a whole number.`)
      .transform((s) => (s === '' ? null : Number(s)))
      .refine((n) => n === null || (n >= min && n <= max), `Use a number from ${min} to ${max}.`),
  );

/** Rack unit of the device's bottom edge (1U = 44.45 mm, EIA-310-D). */
export const ruField = wholeNumber(1, 100, 'the rack unit');

/** Any whole number: a VLAN outside 1–4094 is saved and reported by the analysis (IEEE 802.1Q). */
export const vlanField = trimmed.pipe(
  z
    .string()
    .regex(/^-?\d*$/, 'Enter the VLAN ID as a whole number.')
    .transform((s) => (s === '' ? null : Number(s))),
);

/** Any whole number: an MTU outside 576–9216 is saved and reported by the analysis. */
export const mtuField = trimmed.pipe(
  z
    .string()
    .regex(/^-?\d*$/, 'Enter the MTU in bytes as a whole number.')
    .transform((s) => (s === '' ? null : Number(s))),
);

export const lengthField = trimmed.pipe(
  z
    .string()
    .regex(/^(\d+(\.\d+)?)?$/, 'Enter the length in metres, e.g. 3 or 2.5.')
    .transform((s) => (s === '' ? null : Number(s)))
    .refine((n) => n === null || (n > 0 && n <= 100000), 'A cable is longer than 0 m and at most 100 km.'),
);

export const labelField = trimmed.pipe(z.string().max(100, 'Use at most 100 characters.')).transform((s) => (s === '' ? null : s));

export const cidrField = trimmed.pipe(z.string().refine(isValidCidr, 'Enter a block with its prefix length, e.g. 198.51.100.0/24 or 2001:db8::/64.'));

export const ipField = trimmed.pipe(z.string().refine((s) => s === '' || isValidIp(s), 'Enter an IPv4 or IPv6 address without a prefix, e.g. 198.51.100.21.')).transform((s) => (s === '' ? null : s));

/** The message of a new version, as the server checks it (shared/api/designs.ts). */
export const versionMessageField = trimmed.pipe(z.string().min(1, 'Say what changed in this version.').max(500, 'Use at most 500 characters.'));

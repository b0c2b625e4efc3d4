import type { z } from 'zod';
import type { Issue } from '@/shared/api/common';
import { ownValue } from '@/shared/keys/record';

/**
 * Turns zod's issues into sentences a designer can act on ("Port speed must be one of 1, 2.5, …"),
 * each with the dotted path of the field. Unknown fields get their own path so the editor can point
 * at the exact key. The tables are read with ownValue: a path may hold a key the sender chose.
 */
const FIELD_LABELS: Record<string, string> = {
  format: 'The format',
  name: 'The name',
  id: 'The id',
  kind: 'The device kind',
  role: 'The role',
  speedGbps: 'The port speed (Gb/s)',
  connector: 'The connector',
  networkId: 'The network reference',
  address: 'The address',
  mode: 'The address mode',
  ip: 'The IP address',
  media: 'The cable media',
  lengthM: 'The cable length (m)',
  a: 'The cable end a',
  b: 'The cable end b',
  purpose: 'The network purpose',
  cidr: 'The subnet (CIDR)',
  vlan: 'The VLAN id',
  mtu: 'The MTU',
  gateway: 'The gateway',
  chap: 'The CHAP mode',
  controllers: 'The controller list',
  adapters: 'The card list',
  ports: 'The port list',
  devices: 'The device list',
  cables: 'The cable list',
  networks: 'The network list',
  iqn: 'The iSCSI name',
  rack: 'The rack',
  ru: 'The rack unit',
  site: 'The site',
  rackPitchMm: 'The rack pitch (mm)',
  rowPitchMm: 'The row pitch (mm)',
  slackM: 'The slack (m)',
  racks: 'The rack list',
  row: 'The row',
  position: 'The position in the row',
  heightU: 'The height in rack units',
  powerFeeds: 'The power feed list',
  placement: 'The placement',
  rackId: 'The rack reference',
  psus: 'The power supply list',
  feedId: 'The power feed reference',
  x: 'The x position',
  y: 'The y position',
};

const TYPE_WORDS: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  array: 'a list',
  object: 'an object',
  boolean: 'true or false',
  record: 'an object',
};

type ZodIssue = z.core.$ZodIssue;

/** What one entry of a list is called, for a path that ends at an entry (`devices.3`). */
const ENTRY_LABELS: Record<string, string> = {
  devices: 'The device',
  controllers: 'The controller',
  adapters: 'The card',
  ports: 'The port',
  cables: 'The cable',
  networks: 'The network',
  racks: 'The rack',
  powerFeeds: 'The power feed',
  psus: 'The power supply',
};

/** Counted nouns for list lengths: "at least 1 controller". */
const ENTRY_NOUNS: Record<string, [string, string]> = {
  controllers: ['controller', 'controllers'],
};

function fieldLabel(path: PropertyKey[]): string {
  const last = path[path.length - 1];
  if (path.length === 2 && path[0] === 'layout') return `The position of "${String(last)}"`;
  if (typeof last === 'number') {
    const list = path[path.length - 2];
    const entry = typeof list === 'string' ? ownValue(ENTRY_LABELS, list) : undefined;
    if (entry) return entry;
  }
  const key = [...path].reverse().find((k) => typeof k === 'string');
  if (typeof key !== 'string') return 'The document';
  return ownValue(FIELD_LABELS, key) ?? `The field "${key}"`;
}

function countWords(path: PropertyKey[], count: unknown): string {
  const key = path[path.length - 1];
  const nouns = typeof key === 'string' ? ownValue(ENTRY_NOUNS, key) : undefined;
  const n = String(count);
  return nouns ? `${n} ${count === 1 ? nouns[0] : nouns[1]}` : n;
}

function listWords(values: readonly unknown[]): string {
  const words = values.map((value) => (typeof value === 'string' ? `"${value}"` : String(value)));
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;
}

/** Reads the input at a path without trusting its shape. */
function valueAt(input: unknown, path: PropertyKey[]): unknown {
  let current: unknown = input;
  for (const key of path) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return current;
}

function unionValues(issue: Extract<ZodIssue, { code: 'invalid_union' }>): unknown[] | null {
  const values: unknown[] = [];
  for (const branch of issue.errors) {
    if (branch.length !== 1 || branch[0].code !== 'invalid_value') return null;
    values.push(...branch[0].values);
  }
  return values.length ? values : null;
}

function sentence(issue: ZodIssue, input: unknown): string {
  const label = fieldLabel(issue.path);
  const missing = valueAt(input, issue.path) === undefined;
  if (missing && (issue.code === 'invalid_type' || issue.code === 'invalid_value' || issue.code === 'invalid_union')) {
    return `${label} is required.`;
  }
  switch (issue.code) {
    case 'invalid_type':
      return `${label} must be ${ownValue(TYPE_WORDS, issue.expected) ?? issue.expected}.`;
    case 'invalid_value':
      return `${label} must be ${issue.values.length > 1 ? 'one of ' : ''}${listWords(issue.values)}.`;
    case 'invalid_union': {
      if ('discriminator' in issue && Array.isArray((issue as { options?: unknown[] }).options)) {
        return `${label} must be one of ${listWords((issue as { options: unknown[] }).options)}.`;
      }
      const values = unionValues(issue);
      if (values) return `${label} must be one of ${listWords(values)}.`;
      return `${label} is not in a form this format accepts.`;
    }
    case 'too_small':
      if (issue.origin === 'string') return `${label} must not be empty.`;
      if (issue.origin === 'array') return `${label} needs at least ${countWords(issue.path, Number(issue.minimum))}.`;
      return `${label} must be ${issue.inclusive ? 'at least' : 'greater than'} ${String(issue.minimum)}.`;
    case 'too_big':
      if (issue.origin === 'string') return `${label} must be at most ${String(issue.maximum)} characters.`;
      if (issue.origin === 'array') return `${label} can hold at most ${countWords(issue.path, Number(issue.maximum))}.`;
      return `${label} must be at most ${String(issue.maximum)}.`;
    case 'custom':
      return `${label} ${issue.message}.`;
    default:
      return `${label}: ${issue.message}.`;
  }
}

/** Format 1 fields that format 2 moved: where they went, for the unknown-key sentence. */
const MOVED_IN_FORMAT_2: Record<string, string> = {
  rack: 'a device is placed with "placement": {"rackId", "ru"} and the rack is listed under "racks"',
  ru: 'the unit is "placement.ru"',
};

function unknownKeyMessage(key: string, input: unknown): string {
  const format = valueAt(input, ['format']) === 'cablewright.topology/1' ? 1 : 2;
  const moved = format === 2 && Object.hasOwn(MOVED_IN_FORMAT_2, key) ? `; in format 2 ${MOVED_IN_FORMAT_2[key]}` : '';
  return `"${key}" is not a field of this object in format ${format}${moved ? moved : '; remove it'}.`;
}

/** Every zod issue as `{path, message}`; one issue per unknown key. */
export function describeZodIssues(error: z.ZodError, input: unknown): Issue[] {
  const issues: Issue[] = [];
  for (const issue of error.issues) {
    const base = issue.path.map(String);
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) {
        issues.push({ path: [...base, key].join('.'), message: unknownKeyMessage(key, input) });
      }
      continue;
    }
    issues.push({ path: base.join('.'), message: sentence(issue, input) });
  }
  return issues;
}

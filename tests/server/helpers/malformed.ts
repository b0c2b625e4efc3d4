import fc from 'fast-check';
import { validateTopology } from '@/shared/topology/validate';
import { harborV1 } from './designs';

/**
 * Malformed topology documents for the bad-input tests: the demo's version 1 with one or a few
 * mutations of the kinds the schema must refuse (docs/topology-format.md: wrong types, unknown keys,
 * missing fields, duplicate ids, references to nothing, too few controllers, bad enum values,
 * malformed addresses), plus random JSON. Seeded, so a failure can be reproduced.
 */
type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
type Obj = { [key: string]: Json };
/** `paths`: the issue paths the shared validator gives for the document, as they must appear in the body. */
export type Malformed = { kind: string; document: unknown; paths: string[] };

/** mulberry32: a small seeded generator (public domain). */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let x = Math.imul(a ^ (a >>> 15), 1 | a);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

/** Every object and array inside `root` with where it sits, for picking a random spot. */
function nodes(root: Json): Array<{ value: Obj | Json[]; parent: Obj | Json[] | null; key: string | number | null }> {
  const out: Array<{ value: Obj | Json[]; parent: Obj | Json[] | null; key: string | number | null }> = [];
  const walk = (value: Json, parent: Obj | Json[] | null, key: string | number | null) => {
    if (value === null || typeof value !== 'object') return;
    out.push({ value, parent, key });
    if (Array.isArray(value)) value.forEach((v, i) => walk(v, value, i));
    else for (const [k, v] of Object.entries(value)) walk(v, value, k);
  };
  walk(root, null, null);
  return out;
}

function withIds(doc: Json): Obj[] {
  return nodes(doc).map((n) => n.value).filter((v): v is Obj => !Array.isArray(v) && typeof v.id === 'string');
}

const WRONG_VALUES: Json[] = [null, 42, -1.5, '', 'text', true, [], {}, [1, 2], { nested: 'x' }];

export function malformedDocuments(count: number, seed = 20260107): Malformed[] {
  const rnd = prng(seed);
  const pick = <T>(list: readonly T[]): T => list[Math.floor(rnd() * list.length)];
  const junk = fc.sample(fc.jsonValue({ maxDepth: 4 }), { numRuns: Math.ceil(count / 10), seed });

  const mutations: Record<string, (doc: Obj) => void> = {
    'wrong type': (doc) => {
      const spots = nodes(doc).filter((n) => !Array.isArray(n.value));
      const { value } = pick(spots) as { value: Obj };
      const key = pick(Object.keys(value));
      if (key === undefined) return;
      const current = value[key];
      value[key] = pick(WRONG_VALUES.filter((w) => typeof w !== typeof current || Array.isArray(w) !== Array.isArray(current)));
    },
    'dangling reference': (doc) => {
      const cables = doc.cables as Obj[];
      pick(cables)[pick(['a', 'b'])] = `missing-${Math.floor(rnd() * 1e6)}`;
    },
    'wrong kind of reference': (doc) => {
      // A cable end that names a device, or a port's network that names a port: ids that exist, of the wrong kind.
      const cables = doc.cables as Obj[];
      pick(cables).a = pick(doc.devices as Obj[]).id as string;
    },
    'duplicate id': (doc) => {
      const all = withIds(doc);
      const a = pick(all);
      const b = pick(all.filter((x) => x !== a));
      a.id = b.id;
    },
    'unknown key': (doc) => {
      const spots = nodes(doc).filter((n) => !Array.isArray(n.value));
      (pick(spots).value as Obj)[pick(['colour', 'vendor', 'x', 'speed', 'ID', '__proto__x'])] = 'extra';
    },
    'missing field': (doc) => {
      const required = ['id', 'name', 'kind', 'role', 'speedGbps', 'connector', 'ports', 'a', 'b', 'media', 'cidr', 'purpose', 'format', 'devices'];
      const spots = nodes(doc).filter((n) => !Array.isArray(n.value) && required.some((k) => k in (n.value as Obj)));
      const target = pick(spots).value as Obj;
      delete target[pick(required.filter((k) => k in target))];
    },
    'truncated array': (doc) => {
      const devices = doc.devices as Obj[];
      const victim = pick(devices.filter((d) => d.kind !== 'switch'));
      if (victim.kind === 'array') victim.controllers = [];
      else (victim.adapters as Obj[]).forEach((a) => (a.ports = (a.ports as Json[]).slice(0, 0)));
    },
    'bad enum value': (doc) => {
      const choices: Array<() => void> = [
        () => (pick(doc.cables as Obj[]).media = 'coax'),
        () => (pick(doc.devices as Obj[]).kind = 'router'),
        () => (pick(withIds(doc).filter((o) => 'speedGbps' in o)).speedGbps = 3),
        () => (doc.format = 'cablewright.topology/9'),
        () => (doc.security = { chap: 'sometimes' }),
      ];
      pick(choices)();
    },
    'malformed address': (doc) => {
      const networks = doc.networks as Obj[];
      if (rnd() < 0.5) pick(networks).cidr = pick(['198.51.100.0/33', '10.0.0/24', 'fab-a', '2001:db8::/129']);
      else pick(withIds(doc).filter((o) => 'address' in o)).address = { mode: 'static', ip: pick(['198.51.100.256', '192.0.2.1/24', 'host-1', '2001:db8:::1']) };
    },
    'cable to itself': (doc) => {
      const cable = pick(doc.cables as Obj[]);
      cable.b = cable.a;
    },
  };
  const kinds = Object.keys(mutations);

  const out: Malformed[] = [];
  let junkIndex = 0;
  while (out.length < count) {
    if (out.length % 10 === 9 && junkIndex < junk.length) {
      const document = junk[junkIndex++];
      const paths = issuePaths(document);
      if (paths) out.push({ kind: 'random JSON', document, paths });
      continue;
    }
    const doc = harborV1() as unknown as Obj;
    const applied = 1 + Math.floor(rnd() * 3);
    const names: string[] = [];
    for (let i = 0; i < applied; i++) {
      const kind = pick(kinds);
      try {
        mutations[kind](doc);
        names.push(kind);
      } catch {
        // An earlier mutation already broke the part this one works on (no cables array left, say).
      }
    }
    // A mutation can happen to leave the document valid (a wrong value that is still allowed); keep only invalid ones.
    const paths = names.length > 0 ? issuePaths(doc) : null;
    if (paths) out.push({ kind: names.join(' + '), document: doc, paths });
  }
  return out;
}

/** The validator's issue paths prefixed into the request body, or null for a valid document. */
function issuePaths(document: unknown): string[] | null {
  const checked = validateTopology(document);
  return checked.ok ? null : checked.issues.map((x) => (x.path ? `document.${x.path}` : 'document'));
}

/**
 * Whether an issue path points into the sent document: it must resolve in the document, except that
 * its last segment may name a missing field. Keys may contain dots (ids, random keys), so every way
 * of joining segments into a key is tried.
 */
export function pointsInto(document: unknown, path: string): boolean {
  if (path === 'document') return true;
  if (!path.startsWith('document.')) return false;
  return reach(document, path.slice('document.'.length).split('.'));
}

function reach(node: unknown, segments: string[]): boolean {
  if (segments.length === 0) return true;
  if (node === null || typeof node !== 'object') return false;
  for (let k = 1; k <= segments.length; k++) {
    const key = segments.slice(0, k).join('.');
    if (Object.prototype.hasOwnProperty.call(node, key) && reach((node as Record<string, unknown>)[key], segments.slice(k))) return true;
  }
  return segments.length === 1;
}

import { recordFrom } from '@/shared/keys/record';
import type { Topology } from '@/shared/topology/schema';
import { mulberry32 } from './random-design';

/**
 * Hostile ids for the documents every future change must survive: each name JavaScript's
 * Object.prototype has (so `{}` already "holds" it), ids made of control characters and
 * bidirectional overrides, and families of ids that read the same when joined with a separator
 * (`a\u0001` + `b` and `a` + `\u0001b`). `renameIds` puts them into any valid document, and
 * `safeTwin` maps a document's ids to plain ones in the same code-unit order, so the analysis of
 * the twin, with its ids mapped back, is what the hostile document must give.
 */
export const PROTOTYPE_NAMES: readonly string[] = [...new Set([...Object.getOwnPropertyNames(Object.prototype), '__proto__'])];

export const CONTROL_IDS: readonly string[] = ['\u0000', '\u0001', '\u001f', '\u007f', 'a\u0000', '\u0000a', 'tab\tid', 'line\nid'];

/** Bidirectional overrides and isolates (UAX #9): they reverse the text after them on screen. */
export const BIDI_IDS: readonly string[] = ['\u202e', 'cable\u202e10-A', '\u2066x\u2069', '\u200fport', 'vault\u202d1', '\u2067\u2068'];

const SEPARATORS = ['\u0000', '\u0001', '\n', ',', '.', ':', ' ', '/', '"', '\\'];

/** Ids that collide when two of them are joined with one of the separators code likes to use. */
export function collidingIds(): string[] {
  const out: string[] = [];
  for (const sep of SEPARATORS) out.push(`a${sep}`, `${sep}b`, `a${sep}b`);
  out.push('a', 'b', 'ab');
  return out;
}

/** Every hostile id, without repeats: prototype names first. */
export function hostilePool(): string[] {
  const decorated: string[] = [];
  for (const name of PROTOTYPE_NAMES) for (const sep of ['\u202e', ...SEPARATORS]) decorated.push(`${name}${sep}`, `${sep}${name}`);
  return [...new Set([...PROTOTYPE_NAMES, ...CONTROL_IDS, ...BIDI_IDS, ...collidingIds(), ...decorated])];
}

export type IdKind = 'array' | 'controller' | 'switch' | 'host' | 'adapter' | 'port' | 'cable' | 'network';

export const ID_KINDS: readonly IdKind[] = ['array', 'controller', 'switch', 'host', 'adapter', 'port', 'cable', 'network'];

/** Every id of the document with its kind, in document order. */
export function idsOf(doc: Topology): { id: string; kind: IdKind }[] {
  const out: { id: string; kind: IdKind }[] = [];
  for (const d of doc.devices) {
    out.push({ id: d.id, kind: d.kind });
    if (d.kind === 'switch') for (const p of d.ports) out.push({ id: p.id, kind: 'port' });
    else {
      for (const g of d.kind === 'array' ? d.controllers : d.adapters) {
        out.push({ id: g.id, kind: d.kind === 'array' ? 'controller' : 'adapter' });
        for (const p of g.ports) out.push({ id: p.id, kind: 'port' });
      }
    }
  }
  for (const c of doc.cables) out.push({ id: c.id, kind: 'cable' });
  for (const n of doc.networks) out.push({ id: n.id, kind: 'network' });
  return out;
}

/** The document with every id (and every reference to it, and every layout key) renamed. */
export function renameIds(doc: Topology, rename: (id: string) => string): Topology {
  const port = <P extends { id: string; networkId?: string }>(p: P): P => (p.networkId === undefined ? { ...p, id: rename(p.id) } : { ...p, id: rename(p.id), networkId: rename(p.networkId) });
  const group = <G extends { id: string; ports: { id: string; networkId?: string }[] }>(g: G): G => ({ ...g, id: rename(g.id), ports: g.ports.map(port) });
  const out: Topology = {
    ...doc,
    devices: doc.devices.map((d) => {
      if (d.kind === 'switch') return { ...d, id: rename(d.id), ports: d.ports.map(port) };
      if (d.kind === 'array') return { ...d, id: rename(d.id), controllers: d.controllers.map(group) };
      return { ...d, id: rename(d.id), adapters: d.adapters.map(group) };
    }),
    cables: doc.cables.map((c) => ({ ...c, id: rename(c.id), a: rename(c.a), b: rename(c.b) })),
    networks: doc.networks.map((n) => ({ ...n, id: rename(n.id) })),
  };
  if (doc.layout) out.layout = recordFrom(Object.entries(doc.layout).map(([id, p]) => [rename(id), p] as const));
  return out;
}

/** The document with the id of its `index`-th thing of `kind` replaced by `id`. */
export function withIdOfKind(doc: Topology, kind: IdKind, id: string, index = 0): Topology | null {
  const target = idsOf(doc).filter((x) => x.kind === kind)[index];
  if (!target) return null;
  return renameIds(doc, (old) => (old === target.id ? id : old));
}

/** A hostile id for each of the ids, different ones for different ids, in a seeded order. */
export function hostileMap(ids: readonly string[], seed: number): Map<string, string> {
  const pool = hostilePool();
  const rnd = mulberry32(seed);
  // Prototype names first, the rest shuffled, then the whole order rotated: every seed gives the
  // prototype names to other kinds of things.
  const rest = pool.slice(PROTOTYPE_NAMES.length);
  for (let i = rest.length - 1; i > 0; i -= 1) {
    const j = Math.floor(rnd() * (i + 1));
    [rest[i], rest[j]] = [rest[j], rest[i]];
  }
  if (ids.length > pool.length) throw new Error(`the pool has ${pool.length} ids, the document ${ids.length}`);
  const shift = seed % ids.length;
  const order = [...ids.slice(shift), ...ids.slice(0, shift)];
  const names = [...PROTOTYPE_NAMES, ...rest];
  return new Map(order.map((id, i) => [id, names[i]]));
}

/** The document with every id replaced by a hostile one, in a seeded order. */
export function allHostile(doc: Topology, seed: number): Topology {
  const map = hostileMap(idsOf(doc).map((x) => x.id), seed);
  return renameIds(doc, (id) => map.get(id) ?? id);
}

/** Plain code-unit order, as the analysis sorts. */
const byId = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

export type Twin = { doc: Topology; to: (id: string) => string; back: (value: unknown) => unknown };

/**
 * A copy of the document whose ids are `id-00000`, `id-00001`, … in the code-unit order of the
 * original ids, so every sort gives the same order on both; `back` turns anything computed from
 * the twin (a report, a diff) into the original's terms, in ids and in the sentences that quote
 * them, and `to` gives the twin's id for one of the original's.
 */
export function safeTwin(doc: Topology, extraIds: readonly string[] = []): Twin {
  const ids = [...new Set([...idsOf(doc).map((x) => x.id), ...Object.keys(doc.layout ?? {}), ...extraIds])].sort(byId);
  const safe = new Map(ids.map((id, i) => [id, `id-${String(i).padStart(5, '0')}`]));
  const original = new Map([...safe].map(([id, s]) => [s, id]));
  const text = (s: string) => s.replace(/id-\d{5}/g, (token) => original.get(token) ?? token);
  const back = (value: unknown): unknown => {
    if (typeof value === 'string') return text(value);
    if (Array.isArray(value)) return value.map(back);
    if (value && typeof value === 'object') return recordFrom(Object.entries(value).map(([k, v]) => [text(k), back(v)] as const));
    return value;
  };
  const to = (id: string) => safe.get(id) ?? id;
  return { doc: renameIds(doc, to), to, back };
}

/** What crossing a network does to a document: JSON text and back (own `__proto__` keys included). */
export function overTheWire<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}

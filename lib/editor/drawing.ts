import type { Connector, Device, Media, SwitchRole } from '@/shared/topology/schema';
import type { Rect } from '@/lib/editor/shape';

/**
 * How the canvas draws things, as plain data and path strings, shared by the live canvas and the
 * SVG export so the two always look alike. The silhouettes, marks and cable styles are
 * Cablewright's own: an array is a box with a plinth and a stack mark, a switch has cut corners
 * and a two-way mark, a host has a tab on its top edge. Meaning never rests on colour alone: cable
 * media differ by dash pattern, width and the code in their tag (Cat 6 "6", Cat 6A "6A"), fabrics by a letter tag, single points of failure by a
 * dashed outline, a hatch and a marker.
 */

/** Canvas inks: the design system's palette values (components/ui/tokens.ts), plus fabric inks. */
export const INK = {
  paper: '#f6f5f1',
  surface: '#fffdf9',
  sunken: '#efece4',
  line: '#d8d2c4',
  lineStrong: '#8a8272',
  ink: '#0f3d3e',
  inkMuted: '#4f5e5c',
  primary: '#14595b',
  primarySoft: '#e6efed',
  copper: '#9a4a22',
  copperSoft: '#f3c9a5',
  danger: '#a3271f',
  dangerSoft: '#f9e5e1',
  success: '#2d6a3a',
  successSoft: '#e7f2e6',
  warning: '#7a4f00',
  warningSoft: '#fbf1dc',
  onDark: '#ffffff',
} as const;

/** Fabric inks in tag order; the letter tag carries the meaning, the ink only helps scanning. */
export const FABRIC_INKS = ['#14595b', '#7a3e8f', '#2d6a3a', '#1d5470', '#7a4f00', '#5b4a3a'] as const;

export const FONT_FAMILY = "Inter, 'Inter_400Regular', 'Helvetica Neue', Arial, sans-serif";
export const FONT_FAMILY_BOLD = "Inter, 'Inter_600SemiBold', 'Helvetica Neue', Arial, sans-serif";

export type MediaFamily = 'copper' | 'fibre' | 'direct-attach' | 'active-optical';
/** `short` is the medium's code in a cable's tag ("6", "6A"), so Category 6 and 6A differ in words, not only in width. */
export type CableStyle = { family: MediaFamily; width: number; dash: string | null; label: string; short: string };

const MEDIA_STYLE: Record<Media, CableStyle> = {
  // Twisted-pair copper: solid lines, the better category a little wider.
  cat5e: { family: 'copper', width: 1.5, dash: null, label: 'Cat 5e copper', short: '5e' },
  cat6: { family: 'copper', width: 2, dash: null, label: 'Cat 6 copper', short: '6' },
  cat6a: { family: 'copper', width: 3, dash: null, label: 'Cat 6A copper', short: '6A' },
  // Multimode fibre: long dashes.
  om3: { family: 'fibre', width: 2, dash: '12 5', label: 'OM3 fibre', short: 'OM3' },
  om4: { family: 'fibre', width: 2.5, dash: '12 5', label: 'OM4 fibre', short: 'OM4' },
  // Direct-attach copper: a heavy line of short dashes (a thick, stiff, short cable).
  dac: { family: 'direct-attach', width: 4, dash: '3 3', label: 'Direct-attach copper', short: 'DAC' },
  // Active optical: dash and dot.
  aoc: { family: 'active-optical', width: 2.5, dash: '10 4 2 4', label: 'Active optical', short: 'AOC' },
};

export function cableStyle(media: Media): CableStyle {
  return MEDIA_STYLE[media];
}

/** What a cable's tag says: its fabric and medium ("A · 6A"), or its printed label ("HR-A-07"). */
export type CableTagMode = 'fabric' | 'label';

export function cableTagText(mode: CableTagMode, cable: { id: string; label?: string; media: Media }, fabricTag: string | null): string {
  if (mode === 'label') return cable.label?.trim() || cable.id;
  const short = MEDIA_STYLE[cable.media].short;
  return fabricTag ? `${fabricTag} · ${short}` : short;
}

export const MEDIA_LABELS: Record<Media, string> = Object.fromEntries(
  Object.entries(MEDIA_STYLE).map(([media, style]) => [media, style.label]),
) as Record<Media, string>;

export const SWITCH_ROLE_LABEL: Record<SwitchRole, string> = { data: 'DATA', management: 'MGMT', shared: 'SHARED' };

/** The body outline of a device in its own coordinates. */
export function silhouettePath(kind: Device['kind'], width: number, height: number): string {
  const w = round(width);
  const h = round(height);
  if (kind === 'switch') {
    // Cut corners all round.
    const c = 10;
    return `M${c} 0H${w - c}L${w} ${c}V${h - c}L${w - c} ${h}H${c}L0 ${h - c}V${c}Z`;
  }
  if (kind === 'host') {
    // A tab rising from the top edge at the left: the body starts 6 px lower.
    const t = 6;
    const tab = Math.min(72, w / 3);
    return `M0 ${t + 4}Q0 ${t} 4 ${t}H10L16 0H${round(tab)}L${round(tab + 6)} ${t}H${w - 4}Q${w} ${t} ${w} ${t + 4}V${h - 4}Q${w} ${h} ${w - 4} ${h}H4Q0 ${h} 0 ${h - 4}Z`;
  }
  // Array: rounded box; its plinth is drawn apart (plinthPath).
  return `M6 0H${w - 6}Q${w} 0 ${w} 6V${h - 6}Q${w} ${h} ${w - 6} ${h}H6Q0 ${h} 0 ${h - 6}V6Q0 0 6 0Z`;
}

/** The array's plinth: a bar under the body, a little narrower. */
export function plinthPath(width: number, height: number): string {
  const w = round(width);
  return `M10 ${round(height) + 2}H${w - 10}V${round(height) + 7}H10Z`;
}

/** The small mark at the left of a header that tells the kind at a glance, 16 × 16 at (x, y). */
export function kindMarkPath(kind: Device['kind'], x: number, y: number): string {
  if (kind === 'array') {
    // Three stacked bars: storage shelves.
    return [0, 6, 12].map((dy) => `M${x} ${y + dy}h16v3h-16Z`).join('');
  }
  if (kind === 'switch') {
    // Two opposing arrows: traffic both ways.
    return `M${x} ${y + 5}h12l-3 -3M${x + 16} ${y + 11}h-12l3 3`;
  }
  // A box with a base: a server.
  return `M${x + 1} ${y + 1}h14v10h-14ZM${x + 5} ${y + 14}h6`;
}

/** Whether the mark is drawn filled (array bars) or stroked (arrows, box). */
export function kindMarkFilled(kind: Device['kind']): boolean {
  return kind === 'array';
}

/** A port's outline: an RJ45 port has a latch notch on top, an SFP cage an inner rail. */
export function portPath(connector: Connector, rect: Rect): string {
  const { x, y, width: w, height: h } = rect;
  if (connector === 'rj45') {
    const n = w / 3;
    return `M${x} ${y}H${x + n}V${y + 4}H${x + 2 * n}V${y}H${x + w}V${y + h}H${x}Z`;
  }
  return `M${x} ${y + 3}Q${x} ${y} ${x + 3} ${y}H${x + w - 3}Q${x + w} ${y} ${x + w} ${y + 3}V${y + h - 3}Q${x + w} ${y + h} ${x + w - 3} ${y + h}H${x + 3}Q${x} ${y + h} ${x} ${y + h - 3}Z`;
}

/** The inner rail of an SFP cage (null for RJ45). */
export function portRailPath(connector: Connector, rect: Rect): string | null {
  if (connector !== 'sfp') return null;
  return `M${rect.x + 4} ${rect.y + rect.height - 6}H${rect.x + rect.width - 4}`;
}

/** The marker of a single point of failure: a warning triangle 18 px wide with its tip at (x, y). */
export function spofMarkerPath(x: number, y: number): string {
  return `M${x} ${y}L${x + 10} ${y + 17}H${x - 10}Z`;
}

export const SPOF_DASH = '6 4';
export const HATCH_ID = 'cw-spof-hatch';

/** Midpoint of a cable, where its tag sits. */
export function midpoint(a: { x: number; y: number }, b: { x: number; y: number }): { x: number; y: number } {
  return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}

/** A rough width of a label in px, for sizing tags and badges without measuring text. */
export function textWidth(text: string, fontSize: number): number {
  return Math.ceil(text.length * fontSize * 0.6);
}

/** The header band, following the silhouette's top edge. */
export function headerPath(kind: Device['kind'], width: number, headerHeight: number): string {
  const w = round(width);
  const h = headerHeight;
  if (kind === 'switch') return `M0 ${h}V10L10 0H${w - 10}L${w} 10V${h}Z`;
  if (kind === 'host') {
    const tab = round(Math.min(72, w / 3));
    return `M0 ${h}V10Q0 6 4 6H10L16 0H${tab}L${round(tab + 6)} 6H${w - 4}Q${w} 6 ${w} 10V${h}Z`;
  }
  return `M0 ${h}V6Q0 0 6 0H${w - 6}Q${w} 0 ${w} 6V${h}Z`;
}

export type KindStyle = { body: string; outline: string; header: string; headerText: string; mark: string };

export const KIND_STYLE: Record<Device['kind'], KindStyle> = {
  array: { body: INK.surface, outline: INK.ink, header: INK.ink, headerText: INK.onDark, mark: INK.copperSoft },
  switch: { body: INK.surface, outline: INK.primary, header: INK.primarySoft, headerText: INK.ink, mark: INK.primary },
  host: { body: INK.surface, outline: INK.lineStrong, header: INK.sunken, headerText: INK.ink, mark: INK.inkMuted },
};

/** Where the header's name and mark sit. */
export const HEADER_LAYOUT = { markX: 8, markY: 9, nameX: 30, nameY: 22, nameSize: 13, smallSize: 10.5, portLabelSize: 10.5, groupLabelSize: 11 } as const;

/** What fits inside a 30 px port: the name, cut to five characters, smaller from four. */
export function portCaption(name: string): { text: string; size: number } {
  return { text: name.length > 5 ? `${name.slice(0, 4)}…` : name, size: name.length >= 4 ? 9 : HEADER_LAYOUT.portLabelSize };
}

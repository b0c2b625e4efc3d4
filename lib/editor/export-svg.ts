import type { Media } from '@/shared/topology/schema';
import { MEDIA } from '@/shared/topology/schema';
import { splitIds } from '@/shared/keys/tuple';
import {
  cableStyle,
  cableTagText,
  FONT_FAMILY,
  FONT_FAMILY_BOLD,
  HATCH_ID,
  HEADER_LAYOUT as L,
  headerPath,
  INK,
  KIND_STYLE,
  kindMarkFilled,
  kindMarkPath,
  midpoint,
  plinthPath,
  portCaption,
  portPath,
  portRailPath,
  silhouettePath,
  SPOF_DASH,
  spofMarkerPath,
  SWITCH_ROLE_LABEL,
  textWidth,
} from '@/lib/editor/drawing';
import { computeFabrics, type Fabrics } from '@/lib/editor/fabrics';
import { EMPTY_MARKS, NO_MARKS, type CanvasMarks } from '@/lib/editor/marks';
import { HEADER_HEIGHT } from '@/lib/editor/shape';
import type { CableLine, DeviceBox, Snapshot } from '@/lib/editor/snapshot';

/**
 * The whole diagram as one standalone SVG file: every device, part, port and cable as the canvas
 * draws them, the single points of failure and host badges of the last analysis, and a legend of
 * the cable styles. Fonts are referenced by family name only (nothing embedded or fetched), so
 * the file opens anywhere and falls back to a system face where Inter is not installed.
 */
export type ExportSvgOptions = { marks?: CanvasMarks; fabrics?: Fabrics; padding?: number; title?: string };

const LEGEND_ROW = 22;

/**
 * Characters XML 1.0 does not allow at all, not even escaped (W3C XML 1.0 §2.2, the Char
 * production): C0 controls other than tab, line feed and carriage return, lone surrogates, U+FFFE
 * and U+FFFF. Ids may hold them (names are cleaned when a document is read, ids are not), and one
 * such character would make the whole file unreadable, so they are dropped from the text.
 */
const NOT_XML = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

export function escapeXml(text: string): string {
  return text.replace(NOT_XML, '').replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);
}

function attrs(values: Record<string, string | number | null | undefined>): string {
  return Object.entries(values)
    .filter(([, v]) => v !== null && v !== undefined)
    .map(([k, v]) => `${k}="${typeof v === 'string' ? escapeXml(v) : v}"`)
    .join(' ');
}

function text(x: number, y: number, content: string, extra: Record<string, string | number | undefined> = {}): string {
  return `<text ${attrs({ x, y, ...extra })}>${escapeXml(content)}</text>`;
}

function cableSvg(line: CableLine, fabrics: Fabrics, marks: CanvasMarks): string {
  const style = cableStyle(line.source.media);
  const fabric = fabrics.byCable.get(line.id) ?? null;
  const ink = fabric?.ink ?? INK.lineStrong;
  const mid = midpoint(line.a, line.b);
  const parts: string[] = [];
  const spof = marks.spofCables.has(line.id);
  if (spof) parts.push(`<line ${attrs({ x1: line.a.x, y1: line.a.y, x2: line.b.x, y2: line.b.y, stroke: INK.danger, 'stroke-width': style.width + 6, 'stroke-dasharray': SPOF_DASH, 'stroke-opacity': 0.55 })}/>`);
  parts.push(`<line ${attrs({ x1: line.a.x, y1: line.a.y, x2: line.b.x, y2: line.b.y, stroke: ink, 'stroke-width': style.width, 'stroke-dasharray': style.dash ?? undefined })}/>`);
  const tag = cableTagText('fabric', line.source, fabric?.tag ?? null);
  const w = Math.max(16, textWidth(tag, 10) + 8);
  parts.push(`<rect ${attrs({ x: mid.x - w / 2, y: mid.y - 8, width: w, height: 16, rx: 3, fill: INK.surface, stroke: ink })}/>`);
  parts.push(text(mid.x, mid.y + 4, tag, { 'text-anchor': 'middle', 'font-size': 10, fill: ink, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 600 }));
  if (spof) parts.push(markerSvg(mid.x + 14, mid.y - 22));
  return `<g ${attrs({ id: `cable-${line.id}` })}>${parts.join('')}</g>`;
}

function markerSvg(x: number, y: number): string {
  return `<path ${attrs({ d: spofMarkerPath(x, y), fill: INK.danger, stroke: INK.surface, 'stroke-width': 1.5 })}/>${text(x, y + 14, '!', { 'text-anchor': 'middle', 'font-size': 11, fill: INK.onDark, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 700 })}`;
}

function spofOutline(x: number, y: number, width: number, height: number): string {
  return `<rect ${attrs({ x: x - 3, y: y - 3, width: width + 6, height: height + 6, rx: 6, fill: `url(#${HATCH_ID})`, stroke: INK.danger, 'stroke-width': 2.5, 'stroke-dasharray': SPOF_DASH })}/>${markerSvg(x + 4, y - 12)}`;
}

function deviceSvg(box: DeviceBox, cabled: ReadonlySet<string>, fabrics: Fabrics, marks: CanvasMarks): string {
  const { shape, kind } = box;
  const style = KIND_STYLE[kind];
  const m = marks.devices.get(box.id) ?? NO_MARKS;
  const out: string[] = [];
  if (kind === 'array') out.push(`<path ${attrs({ d: plinthPath(shape.width, shape.height), fill: style.outline })}/>`);
  out.push(`<path ${attrs({ d: silhouettePath(kind, shape.width, shape.height), fill: style.body, stroke: style.outline, 'stroke-width': 1.5 })}/>`);
  out.push(`<path ${attrs({ d: headerPath(kind, shape.width, HEADER_HEIGHT), fill: style.header })}/>`);
  const mark = kindMarkPath(kind, L.markX, L.markY);
  out.push(kindMarkFilled(kind) ? `<path ${attrs({ d: mark, fill: style.mark })}/>` : `<path ${attrs({ d: mark, fill: 'none', stroke: style.mark, 'stroke-width': 1.8, 'stroke-linecap': 'round' })}/>`);
  out.push(text(L.nameX, L.nameY, box.name, { 'font-size': L.nameSize, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 600, fill: style.headerText }));
  if (kind === 'switch' && box.switchRole) {
    const fabric = fabrics.bySwitch.get(box.id);
    const label = fabric ? `${SWITCH_ROLE_LABEL[box.switchRole]} · ${fabric.tag}` : SWITCH_ROLE_LABEL[box.switchRole];
    out.push(text(shape.width - 10, L.nameY, label, { 'text-anchor': 'end', 'font-size': L.smallSize, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 600, fill: style.headerText }));
  }
  if (m.badge) {
    const w = textWidth(m.badge.text, L.smallSize) + 22;
    const x = shape.width - w - 6;
    const ink = m.badge.redundant ? INK.success : INK.danger;
    out.push(`<rect ${attrs({ x, y: 10, width: w, height: 18, rx: 9, fill: m.badge.redundant ? INK.successSoft : INK.dangerSoft, stroke: ink, 'stroke-dasharray': m.badge.redundant ? undefined : '3 2' })}/>`);
    out.push(text(x + 16, 23, m.badge.text, { 'font-size': L.smallSize, fill: ink, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 600 }));
    out.push(text(x + 8, 23, m.badge.redundant ? '✓' : '!', { 'text-anchor': 'middle', 'font-size': L.smallSize, fill: ink, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 700 }));
  }
  const spofGroups = new Set(splitIds(m.spofGroups));
  for (const group of shape.groups) {
    const r = group.rect;
    out.push(`<rect ${attrs({ x: r.x, y: r.y, width: r.width, height: r.height, rx: 4, fill: INK.paper, stroke: INK.line })}/>`);
    out.push(text(r.x + 5, r.y + 13, group.name, { 'font-size': L.groupLabelSize, fill: INK.inkMuted, 'font-family': FONT_FAMILY }));
    if (spofGroups.has(group.id)) out.push(spofOutline(r.x, r.y, r.width, r.height));
  }
  for (const port of shape.ports) {
    const fill = cabled.has(port.id) ? INK.primarySoft : INK.surface;
    out.push(`<path ${attrs({ d: portPath(port.connector, port.rect), fill, stroke: port.role === 'management' ? INK.copper : INK.inkMuted, 'stroke-width': 1.2, 'stroke-dasharray': port.role === 'management' ? '3 2' : undefined })}/>`);
    const rail = portRailPath(port.connector, port.rect);
    if (rail) out.push(`<path ${attrs({ d: rail, stroke: INK.inkMuted, 'stroke-width': 1 })}/>`);
    const caption = portCaption(port.name);
    out.push(text(port.anchor.x, port.anchor.y + 4, caption.text, { 'text-anchor': 'middle', 'font-size': caption.size, fill: INK.ink, 'font-family': FONT_FAMILY }));
  }
  if (m.spof) out.push(spofOutline(0, 0, shape.width, shape.height));
  return `<g ${attrs({ id: `device-${box.id}`, transform: `translate(${box.position.x} ${box.position.y})` })}>${out.join('')}</g>`;
}

function legendSvg(x: number, y: number, used: ReadonlySet<Media>): string {
  const rows = MEDIA.filter((m) => used.has(m));
  const out: string[] = [text(x, y, 'Cables', { 'font-size': 12, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 600, fill: INK.ink })];
  rows.forEach((media, i) => {
    const style = cableStyle(media);
    const ry = y + 16 + i * LEGEND_ROW;
    out.push(`<line ${attrs({ x1: x, y1: ry, x2: x + 48, y2: ry, stroke: INK.ink, 'stroke-width': style.width, 'stroke-dasharray': style.dash ?? undefined })}/>`);
    out.push(text(x + 58, ry + 4, `${style.label} (tag “${style.short}”)`, { 'font-size': 11, fill: INK.ink, 'font-family': FONT_FAMILY }));
  });
  const sy = y + 16 + rows.length * LEGEND_ROW;
  out.push(markerSvg(x + 10, sy - 8));
  out.push(text(x + 58, sy + 4, 'single point of failure (dashed outline, hatch)', { 'font-size': 11, fill: INK.ink, 'font-family': FONT_FAMILY }));
  return out.join('');
}

export function legendHeight(mediaCount: number): number {
  return 16 + (mediaCount + 1) * LEGEND_ROW + 8;
}

export function exportSvg(snapshot: Snapshot, options: ExportSvgOptions = {}): string {
  const marks = options.marks ?? EMPTY_MARKS;
  const fabrics = options.fabrics ?? computeFabrics(snapshot.doc);
  const padding = options.padding ?? 40;
  const bounds = snapshot.bounds ?? { x: 0, y: 0, width: 320, height: 120 };
  const used = new Set(snapshot.doc.cables.map((c) => c.media));
  const titleHeight = 36;
  const legend = legendHeight(used.size);
  const x = bounds.x - padding;
  const y = bounds.y - padding - titleHeight;
  const width = Math.max(bounds.width + 2 * padding, 420);
  const height = bounds.height + 2 * padding + titleHeight + legend;
  const cabled = new Set(snapshot.doc.cables.flatMap((c) => [c.a, c.b]));
  const title = options.title ?? snapshot.doc.name;
  const hatch = `<pattern ${attrs({ id: HATCH_ID, width: 8, height: 8, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' })}><rect width="8" height="8" fill="${INK.dangerSoft}" fill-opacity="0.35"/><line x1="0" y1="0" x2="0" y2="8" stroke="${INK.danger}" stroke-width="2" stroke-opacity="0.35"/></pattern>`;
  return [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" ${attrs({ width: Math.ceil(width), height: Math.ceil(height), viewBox: `${x} ${y} ${Math.ceil(width)} ${Math.ceil(height)}` })}>`,
    `<title>${escapeXml(title)}</title>`,
    `<defs>${hatch}</defs>`,
    `<rect ${attrs({ x, y, width: Math.ceil(width), height: Math.ceil(height), fill: INK.paper })}/>`,
    text(x + padding, y + padding + 8, title, { 'font-size': 18, 'font-family': FONT_FAMILY_BOLD, 'font-weight': 700, fill: INK.ink }),
    `<g id="cables">${[...snapshot.cables.values()].map((line) => cableSvg(line, fabrics, marks)).join('')}</g>`,
    `<g id="devices">${[...snapshot.devices.values()].map((box) => deviceSvg(box, cabled, fabrics, marks)).join('')}</g>`,
    `<g id="legend">${legendSvg(x + padding, bounds.y + bounds.height + padding, used)}</g>`,
    `</svg>`,
  ].join('\n');
}

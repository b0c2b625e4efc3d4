import type { Report } from '@/shared/analysis/types';
import { deviceShape, HEADER_HEIGHT, type DeviceShape, type Point } from '@/shared/layout/shape';
import { displayName } from '@/shared/topology/index';
import { positionOf } from '@/shared/topology/layout';
import type { Device, Topology } from '@/shared/topology/schema';

/**
 * The topology picture of the handover pack as one SVG string, built from the shared layout data
 * (the device shapes of shared/layout/shape.ts and the document's layout), so the server can draw
 * it without client code: devices with their parts and ports where the canvas puts them, cables
 * as lines with their labels, and the single points of failure of the version's report outlined
 * in red and dashed. Devices the layout does not place go in a row underneath, as on the canvas.
 */
const INK = '#1b2530';
const MUTED = '#55606b';
const PAPER = '#ffffff';
const BODY: Record<Device['kind'], string> = { host: '#e7eef5', switch: '#e6f1ee', array: '#efe9f4' };
const DANGER = '#a3261f';
const FONT = 'Inter';
const FONT_BOLD = 'Inter_600SemiBold';

const NOT_XML = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;
const esc = (text: string) => text.replace(NOT_XML, '').replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);

function positions(doc: Topology, shapes: Map<string, DeviceShape>): Map<string, Point> {
  const out = new Map<string, Point>();
  let bottom = -Infinity;
  let left = Infinity;
  const unplaced: Device[] = [];
  for (const device of doc.devices) {
    const p = positionOf(doc, device.id);
    if (!p) unplaced.push(device);
    else {
      out.set(device.id, p);
      bottom = Math.max(bottom, p.y + shapes.get(device.id)!.height);
      left = Math.min(left, p.x);
    }
  }
  let x = Number.isFinite(left) ? left : 0;
  const y = Number.isFinite(bottom) ? bottom + 80 : 0;
  for (const device of unplaced) {
    out.set(device.id, { x, y });
    x += shapes.get(device.id)!.width + 40;
  }
  return out;
}

export function topologySvg(doc: Topology, report: Pick<Report, 'hosts'>): string {
  const shapes = new Map(doc.devices.map((d) => [d.id, deviceShape(d)]));
  const at = positions(doc, shapes);
  const spof = new Set(report.hosts.flatMap((h) => h.singlePointsOfFailure));
  const anchors = new Map<string, Point>();
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  const devices: string[] = [];
  for (const device of doc.devices) {
    const shape = shapes.get(device.id)!;
    const p = at.get(device.id)!;
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x + shape.width);
    maxY = Math.max(maxY, p.y + shape.height);
    const parts: string[] = [];
    parts.push(`<rect x="0" y="0" width="${shape.width}" height="${shape.height}" rx="6" fill="${BODY[device.kind]}" stroke="${INK}" stroke-width="1.2"/>`);
    parts.push(`<text x="10" y="${HEADER_HEIGHT / 2 + 5}" font-size="13" font-family="${FONT_BOLD}" fill="${INK}">${esc(displayName(device))}</text>`);
    const names = new Map<string, string>();
    if (device.kind === 'host') for (const a of device.adapters) names.set(a.id, displayName(a));
    if (device.kind === 'array') for (const c of device.controllers) names.set(c.id, displayName(c));
    for (const group of shape.groups) {
      const r = group.rect;
      const dash = spof.has(group.id) ? ` stroke-dasharray="5 3"` : '';
      parts.push(`<rect x="${r.x}" y="${r.y}" width="${r.width}" height="${r.height}" rx="4" fill="${PAPER}" stroke="${spof.has(group.id) ? DANGER : MUTED}" stroke-width="${spof.has(group.id) ? 2 : 0.8}"${dash}/>`);
      parts.push(`<text x="${r.x + 5}" y="${r.y + 13}" font-size="10" font-family="${FONT}" fill="${MUTED}">${esc(names.get(group.id) ?? group.name)}</text>`);
    }
    for (const port of shape.ports) {
      const r = port.rect;
      parts.push(`<rect x="${r.x}" y="${r.y}" width="${r.width}" height="${r.height}" rx="2" fill="${PAPER}" stroke="${MUTED}" stroke-width="0.8"${port.role === 'management' ? ' stroke-dasharray="3 2"' : ''}/>`);
      parts.push(`<text x="${port.anchor.x}" y="${port.anchor.y + 3}" font-size="8" text-anchor="middle" font-family="${FONT}" fill="${INK}">${esc(port.name.slice(0, 6))}</text>`);
      anchors.set(port.id, { x: p.x + port.anchor.x, y: p.y + port.anchor.y });
    }
    if (spof.has(device.id)) parts.push(`<rect x="-3" y="-3" width="${shape.width + 6}" height="${shape.height + 6}" rx="8" fill="none" stroke="${DANGER}" stroke-width="2.5" stroke-dasharray="6 4"/>`);
    devices.push(`<g transform="translate(${p.x} ${p.y})">${parts.join('')}</g>`);
  }
  const cables: string[] = [];
  for (const cable of doc.cables) {
    const a = anchors.get(cable.a);
    const b = anchors.get(cable.b);
    if (!a || !b) continue;
    const ink = spof.has(cable.id) ? DANGER : INK;
    cables.push(`<line x1="${a.x}" y1="${a.y}" x2="${b.x}" y2="${b.y}" stroke="${ink}" stroke-width="${spof.has(cable.id) ? 2.5 : 1.2}"${spof.has(cable.id) ? ' stroke-dasharray="6 4"' : ''}/>`);
    if (cable.label) {
      const mx = (a.x + b.x) / 2;
      const my = (a.y + b.y) / 2;
      const w = cable.label.length * 5.5 + 8;
      cables.push(`<rect x="${mx - w / 2}" y="${my - 7}" width="${w}" height="14" rx="3" fill="${PAPER}" stroke="${ink}" stroke-width="0.6"/><text x="${mx}" y="${my + 3.5}" font-size="9" text-anchor="middle" font-family="${FONT}" fill="${ink}">${esc(cable.label)}</text>`);
    }
  }
  if (!Number.isFinite(minX)) {
    minX = 0;
    minY = 0;
    maxX = 320;
    maxY = 120;
  }
  const pad = 30;
  const x = minX - pad;
  const y = minY - pad;
  const width = Math.ceil(maxX - minX + 2 * pad);
  const height = Math.ceil(maxY - minY + 2 * pad);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="${x} ${y} ${width} ${height}">`,
    `<title>${esc(doc.name)}</title>`,
    `<rect x="${x}" y="${y}" width="${width}" height="${height}" fill="${PAPER}"/>`,
    `<g id="cables">${cables.join('')}</g>`,
    `<g id="devices">${devices.join('')}</g>`,
    `</svg>`,
  ].join('\n');
}

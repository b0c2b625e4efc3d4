import type { Rack, Topology } from '@/shared/topology/schema';

/**
 * Puts a synthetic design into a room: 42U racks in rows of ten, filled in document order (arrays
 * 2U, switches and hosts 1U), so most cables run between racks and rows and every estimate is used.
 */
export function inRacks(doc: Topology): Topology {
  const racks: Rack[] = [];
  let rack: Rack | null = null;
  let next = 1;
  const devices = doc.devices.map((device) => {
    const height = device.kind === 'array' ? 2 : 1;
    if (!rack || next + height - 1 > 42) {
      const n = racks.length;
      rack = { id: `rack-${n}`, name: `${String.fromCharCode(65 + Math.floor(n / 10) % 26)}${String((n % 10) + 1).padStart(2, '0')}`, row: String(Math.floor(n / 10)), position: (n % 10) + 1, heightU: 42 };
      racks.push(rack);
      next = 1;
    }
    const placed = { ...device, placement: { rackId: rack.id, ru: next, heightU: height } };
    next += height;
    return placed;
  });
  return { ...doc, racks, devices };
}

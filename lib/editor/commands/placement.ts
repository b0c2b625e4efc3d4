import { lowestFreeUnit } from '@/shared/racks/occupancy';
import { deviceHeightU } from '@/shared/racks/geometry';
import { DEFAULT_RACK_HEIGHT_U, type Device, type Placement, type Rack, type Topology } from '@/shared/topology/schema';
import { CommandError } from '@/lib/editor/errors';
import { claimId, collectIds, slug } from '@/lib/editor/ids';

/**
 * Where a device sits in the room (format 2 `placement`). The inspector names a rack by its printed
 * name: a name no rack has yet adds that rack (42U, the format's default), so typing "A02" is
 * enough to start a second rack. Choosing a rack without a unit puts the device in the lowest
 * units free for its height (unit 1 when the rack is full — the overlap is then a finding, never a
 * refusal). A unit needs a rack to be in; clearing either unplaces the device.
 */
export type PlacementChange = { rack?: string | null; ru?: number | null };

export function withPlacement(doc: Topology, device: Device, change: PlacementChange): Topology {
  if (change.rack === undefined && change.ru === undefined) return doc;
  if (change.rack === null || change.ru === null) return setPlacement(doc, device.id, null);
  let next = doc;
  let rackId = device.placement?.rackId;
  if (change.rack !== undefined) {
    const found = rackNamed(doc, change.rack);
    if (found) rackId = found.id;
    else {
      const rack: Rack = { id: claimId(collectIds(doc), `rk-${slug(change.rack) || 'rack'}`), name: change.rack, heightU: DEFAULT_RACK_HEIGHT_U };
      next = { ...doc, racks: [...(doc.racks ?? []), rack] };
      rackId = rack.id;
    }
  }
  if (rackId === undefined) throw new CommandError('refused', 'Choose a rack first; a rack unit is counted within a rack.', 'ru');
  const sameRack = device.placement?.rackId === rackId;
  const ru = change.ru ?? (sameRack ? device.placement!.ru : lowestFreeUnit(next, rackId, deviceHeightU(device), device.id) ?? 1);
  const placement: Placement = { rackId, ru };
  if (device.placement?.heightU !== undefined) placement.heightU = device.placement.heightU;
  return setPlacement(next, device.id, placement);
}

/** The first rack with this printed name (names are what people type; ids are ours). */
function rackNamed(doc: Topology, name: string): Rack | undefined {
  return (doc.racks ?? []).find((rack) => rack.name === name);
}

export function setPlacement(doc: Topology, deviceId: string, placement: Placement | null): Topology {
  let changed = false;
  const devices = doc.devices.map((device) => {
    if (device.id !== deviceId) return device;
    const before = device.placement;
    if (placement === null ? before === undefined : before && before.rackId === placement.rackId && before.ru === placement.ru && before.heightU === placement.heightU) return device;
    changed = true;
    if (placement === null) {
      const { placement: _gone, ...rest } = device;
      return rest as Device;
    }
    return { ...device, placement };
  });
  return changed ? { ...doc, devices } : doc;
}

import { memo } from 'react';
import type { CableTagMode } from '@/lib/editor/drawing';
import type { Fabrics } from '@/lib/editor/fabrics';
import { NO_MARKS, type CanvasMarks } from '@/lib/editor/marks';
import type { Snapshot } from '@/lib/editor/snapshot';
import { CableView } from '@/components/canvas/CableView';
import { DeviceNode } from '@/components/canvas/DeviceNode';

/**
 * The two layers of the drawing, cables under devices. Each maps over its items and passes
 * value-comparable props, so only items whose box, line, selection or marks changed re-render.
 */
type CableLayerProps = { cables: Snapshot['cables']; fabrics: Fabrics; selection: ReadonlySet<string>; marks: CanvasMarks; detail: boolean; tags: CableTagMode };

export const CableLayer = memo(function CableLayer({ cables, fabrics, selection, marks, detail, tags }: CableLayerProps) {
  const out = [];
  for (const line of cables.values()) {
    out.push(<CableView key={line.id} line={line} fabric={fabrics.byCable.get(line.id) ?? null} selected={selection.has(line.id)} spof={marks.spofCables.has(line.id)} detail={detail} tags={tags} />);
  }
  return <>{out}</>;
});

type DeviceLayerProps = {
  devices: Snapshot['devices'];
  /** Labels inside devices are drawn (the zoom makes them readable). */
  detail: boolean;
  fabrics: Fabrics;
  selection: ReadonlySet<string>;
  /** Selected part ids per device, "\n"-joined. */
  partsByDevice: ReadonlyMap<string, string>;
  cabledByDevice: ReadonlyMap<string, string>;
  pendingPort: string | null;
  pendingDevice: string | null;
  marks: CanvasMarks;
};

export const DeviceLayer = memo(function DeviceLayer({ devices, detail, fabrics, selection, partsByDevice, cabledByDevice, pendingPort, pendingDevice, marks }: DeviceLayerProps) {
  const out = [];
  for (const box of devices.values()) {
    out.push(
      <DeviceNode
        key={box.id}
        box={box}
        detail={detail}
        selected={selection.has(box.id)}
        selectedParts={partsByDevice.get(box.id) ?? ''}
        pendingPort={pendingDevice === box.id ? pendingPort : null}
        cabled={cabledByDevice.get(box.id) ?? ''}
        marks={marks.devices.get(box.id) ?? NO_MARKS}
        fabric={box.kind === 'switch' ? (fabrics.bySwitch.get(box.id) ?? null) : null}
      />,
    );
  }
  return <>{out}</>;
});

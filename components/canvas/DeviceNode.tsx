import { memo, useMemo } from 'react';
import { G, Path, Rect, Text } from 'react-native-svg';
import { splitIds } from '@/shared/keys/tuple';
import { HEADER_LAYOUT as L, INK, KIND_STYLE, plinthPath, silhouettePath } from '@/lib/editor/drawing';
import type { FabricTag } from '@/lib/editor/fabrics';
import type { DeviceMarks } from '@/lib/editor/marks';
import type { DeviceShape } from '@/lib/editor/shape';
import type { DeviceBox } from '@/lib/editor/snapshot';
import { fonts } from '@/components/ui';
import { DeviceHeader } from '@/components/canvas/DeviceHeader';
import { PortGlyph } from '@/components/canvas/PortGlyph';
import { SpofOutline } from '@/components/canvas/SpofMark';

/**
 * One device on the canvas. The outer group carries only the position; everything inside is the
 * device's shape in its own coordinates, memoised on the shape (cached per device object), so a
 * drag that moves the device re-renders one transform and nothing inside it. Sets of ids arrive
 * as joinIds strings (shared/keys/tuple.ts) so memo compares them by value.
 */
export type DeviceNodeProps = {
  box: DeviceBox;
  /** Port and group labels are drawn (off when zoomed out too far to read them). */
  detail: boolean;
  selected: boolean;
  /** Selected controllers, cards and ports of this device. */
  selectedParts: string;
  pendingPort: string | null;
  cabled: string;
  marks: DeviceMarks;
  fabric: FabricTag | null;
};

const split = (joined: string) => new Set(splitIds(joined));

type BodyProps = Omit<DeviceNodeProps, 'box' | 'selected'> & { id: string; kind: DeviceBox['kind']; name: string; switchRole: DeviceBox['switchRole']; shape: DeviceShape };

const DeviceBody = memo(function DeviceBody({ id, kind, name, switchRole, shape, detail, selectedParts, pendingPort, cabled, marks, fabric }: BodyProps) {
  const style = KIND_STYLE[kind];
  const cabledSet = useMemo(() => split(cabled), [cabled]);
  const partSet = useMemo(() => split(selectedParts), [selectedParts]);
  const spofGroups = useMemo(() => split(marks.spofGroups), [marks.spofGroups]);
  return (
    <>
      {kind === 'array' ? <Path d={plinthPath(shape.width, shape.height)} fill={style.outline} /> : null}
      <Path d={silhouettePath(kind, shape.width, shape.height)} fill={style.body} stroke={style.outline} strokeWidth={1.5} />
      <DeviceHeader id={id} kind={kind} name={name} width={shape.width} switchRole={switchRole} fabric={fabric} badge={marks.badge} />
      {shape.groups.map((group) => {
        const selected = partSet.has(group.id);
        const r = group.rect;
        return (
          <G key={group.id} testID={`group-${group.id}`}>
            <Rect x={r.x} y={r.y} width={r.width} height={r.height} rx={4} fill={INK.paper} stroke={selected ? INK.copper : INK.line} strokeWidth={selected ? 3 : 1} />
            {detail ? (
              <Text x={r.x + 5} y={r.y + 13} fontSize={L.groupLabelSize} fontFamily={selected ? fonts.semibold : fonts.regular} fill={selected ? INK.copper : INK.inkMuted}>
                {group.name}
              </Text>
            ) : null}
          </G>
        );
      })}
      {shape.ports.map((port) => (
        <PortGlyph key={port.id} port={port} detail={detail} cabled={cabledSet.has(port.id)} selected={partSet.has(port.id)} pending={pendingPort === port.id} />
      ))}
      {shape.groups.filter((g) => spofGroups.has(g.id)).map((g) => (
        <SpofOutline key={`spof-${g.id}`} unitId={g.id} x={g.rect.x} y={g.rect.y} width={g.rect.width} height={g.rect.height} />
      ))}
      {marks.spof ? <SpofOutline unitId={id} x={0} y={0} width={shape.width} height={shape.height} /> : null}
    </>
  );
});

export const DeviceNode = memo(function DeviceNode({ box, selected, ...rest }: DeviceNodeProps) {
  const { shape } = box;
  const label = `${box.kind} ${box.name}${rest.marks.badge ? `, ${rest.marks.badge.description}` : ''}${rest.marks.spof ? ', single point of failure' : ''}`;
  return (
    <G transform={`translate(${box.position.x} ${box.position.y})`} testID={`device-${box.id}`} aria-label={label} aria-selected={selected}>
      {selected ? <Rect x={-6} y={-6} width={shape.width + 12} height={shape.height + 12 + (box.kind === 'array' ? 8 : 0)} rx={10} fill="none" stroke={INK.copper} strokeWidth={3} /> : null}
      <DeviceBody id={box.id} kind={box.kind} name={box.name} switchRole={box.switchRole} shape={shape} {...rest} />
    </G>
  );
});

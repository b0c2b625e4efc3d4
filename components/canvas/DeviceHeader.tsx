import { memo } from 'react';
import { G, Path, Rect, Text } from 'react-native-svg';
import { HEADER_LAYOUT as L, headerPath, INK, KIND_STYLE, kindMarkFilled, kindMarkPath, SWITCH_ROLE_LABEL, textWidth } from '@/lib/editor/drawing';
import type { FabricTag } from '@/lib/editor/fabrics';
import type { HostBadge } from '@/lib/editor/marks';
import { HEADER_HEIGHT } from '@/lib/editor/shape';
import type { DeviceBox } from '@/lib/editor/snapshot';
import { fonts } from '@/components/ui';

type HeaderProps = { id: string; kind: DeviceBox['kind']; name: string; width: number; switchRole?: DeviceBox['switchRole']; fabric: FabricTag | null; badge: HostBadge | null };

/** Cut a name to what fits in `room` px at the header's size. */
export function fitName(name: string, room: number, size = L.nameSize): string {
  const max = Math.max(3, Math.floor(room / (size * 0.6)));
  return name.length <= max ? name : `${name.slice(0, max - 1)}…`;
}

/** A host's badge: sessions, a check (redundant) or "!" with a dashed border (not). */
function Badge({ id, badge, right }: { id: string; badge: HostBadge; right: number }) {
  const w = textWidth(badge.text, L.smallSize) + 22;
  const x = right - w - 6;
  const ink = badge.redundant ? INK.success : INK.danger;
  return (
    <G testID={`host-badge-${id}`} aria-label={badge.description}>
      <Rect x={x} y={10} width={w} height={18} rx={9} fill={badge.redundant ? INK.successSoft : INK.dangerSoft} stroke={ink} strokeDasharray={badge.redundant ? undefined : '3 2'} />
      {badge.redundant ? (
        <Path d={`M${x + 5} ${19}l2.5 3 5 -6`} stroke={ink} strokeWidth={1.8} fill="none" strokeLinecap="round" />
      ) : (
        <Text x={x + 9} y={23} fontSize={L.smallSize} fontFamily={fonts.bold} fill={ink} textAnchor="middle">
          !
        </Text>
      )}
      <Text x={x + 16} y={23} fontSize={L.smallSize} fontFamily={fonts.semibold} fill={ink}>
        {badge.text}
      </Text>
    </G>
  );
}

/** The header band: kind mark, name, and the switch's role and fabric or the host's badge. */
export const DeviceHeader = memo(function DeviceHeader({ id, kind, name, width, switchRole, fabric, badge }: HeaderProps) {
  const style = KIND_STYLE[kind];
  const mark = kindMarkPath(kind, L.markX, L.markY);
  const roleText = switchRole ? (fabric ? `${SWITCH_ROLE_LABEL[switchRole]} · ${fabric.tag}` : SWITCH_ROLE_LABEL[switchRole]) : '';
  const rightReserved = badge ? textWidth(badge.text, L.smallSize) + 34 : roleText ? textWidth(roleText, L.smallSize) + 16 : 8;
  return (
    <G testID={`device-header-${id}`}>
      <Path d={headerPath(kind, width, HEADER_HEIGHT)} fill={style.header} />
      {kindMarkFilled(kind) ? <Path d={mark} fill={style.mark} /> : <Path d={mark} fill="none" stroke={style.mark} strokeWidth={1.8} strokeLinecap="round" />}
      <Text x={L.nameX} y={L.nameY} fontSize={L.nameSize} fontFamily={fonts.semibold} fill={style.headerText}>
        {fitName(name, width - L.nameX - rightReserved)}
      </Text>
      {roleText ? (
        <Text x={width - 10} y={L.nameY} fontSize={L.smallSize} fontFamily={fonts.semibold} fill={style.headerText} textAnchor="end">
          {roleText}
        </Text>
      ) : null}
      {badge ? <Badge id={id} badge={badge} right={width} /> : null}
    </G>
  );
});

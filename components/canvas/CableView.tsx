import { memo } from 'react';
import { G, Line, Rect, Text } from 'react-native-svg';
import { cableStyle, INK, midpoint, SPOF_DASH, textWidth } from '@/lib/editor/drawing';
import type { FabricTag } from '@/lib/editor/fabrics';
import type { CableLine } from '@/lib/editor/snapshot';
import { fonts } from '@/components/ui';
import { SpofMarker } from '@/components/canvas/SpofMark';

type CableViewProps = { line: CableLine; fabric: FabricTag | null; selected: boolean; spof: boolean };

/**
 * One cable from port anchor to port anchor: width and dash pattern say the media, a letter tag at
 * the middle says the fabric, a dashed halo and the marker say it is a single point of failure.
 */
export const CableView = memo(function CableView({ line, fabric, selected, spof }: CableViewProps) {
  const style = cableStyle(line.source.media);
  const ink = fabric?.ink ?? INK.lineStrong;
  const mid = midpoint(line.a, line.b);
  const tagWidth = fabric ? Math.max(16, textWidth(fabric.tag, 10) + 8) : 0;
  const label = `cable ${line.source.label ?? line.id}, ${style.label}${fabric ? `, fabric ${fabric.tag}` : ''}${spof ? ', single point of failure' : ''}`;
  return (
    <G testID={`cable-${line.id}`} aria-label={label} aria-selected={selected}>
      {selected ? <Line x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={INK.copperSoft} strokeWidth={style.width + 8} strokeLinecap="round" /> : null}
      {spof ? <Line testID={`spof-mark-${line.id}`} x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={INK.danger} strokeOpacity={0.55} strokeWidth={style.width + 6} strokeDasharray={SPOF_DASH} /> : null}
      <Line x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={selected ? INK.copper : ink} strokeWidth={style.width} strokeDasharray={style.dash ?? undefined} />
      {fabric ? (
        <>
          <Rect x={mid.x - tagWidth / 2} y={mid.y - 8} width={tagWidth} height={16} rx={3} fill={INK.surface} stroke={ink} />
          <Text x={mid.x} y={mid.y + 4} fontSize={10} fontFamily={fonts.semibold} fill={ink} textAnchor="middle">
            {fabric.tag}
          </Text>
        </>
      ) : null}
      {spof ? <SpofMarker x={mid.x + 14} y={mid.y - 22} /> : null}
    </G>
  );
});

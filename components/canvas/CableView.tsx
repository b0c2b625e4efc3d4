import { memo } from 'react';
import { G, Line, Rect, Text } from 'react-native-svg';
import { cableStyle, cableTagText, INK, midpoint, SPOF_DASH, textWidth, type CableTagMode } from '@/lib/editor/drawing';
import type { FabricTag } from '@/lib/editor/fabrics';
import type { CableLine } from '@/lib/editor/snapshot';
import { fonts } from '@/components/ui';
import { SpofMarker } from '@/components/canvas/SpofMark';

/** The cable's tag in a small box centred on (0, 0); memoised, so a moving cable only moves its group. */
const CableTagMark = memo(function CableTagMark({ tag, ink }: { tag: string; ink: string }) {
  const width = Math.max(16, textWidth(tag, 10) + 8);
  return (
    <>
      <Rect x={-width / 2} y={-8} width={width} height={16} rx={3} fill={INK.surface} stroke={ink} />
      <Text x={0} y={4} fontSize={10} fontFamily={fonts.semibold} fill={ink} textAnchor="middle">
        {tag}
      </Text>
    </>
  );
});

type CableViewProps = { line: CableLine; fabric: FabricTag | null; selected: boolean; spof: boolean; detail?: boolean; tags?: CableTagMode };

/**
 * One cable from port anchor to port anchor: width and dash pattern say the media, the tag at the
 * middle its fabric letter and medium code ("A · 6A") or its printed label, a dashed halo and the
 * marker say it is a single point of failure.
 */
export const CableView = memo(function CableView({ line, fabric, selected, spof, detail = true, tags = 'fabric' }: CableViewProps) {
  const style = cableStyle(line.source.media);
  const ink = fabric?.ink ?? INK.lineStrong;
  const mid = midpoint(line.a, line.b);
  const tag = cableTagText(tags, line.source, fabric?.tag ?? null);
  const label = `cable ${line.source.label ?? line.id}, ${style.label}${fabric ? `, fabric ${fabric.tag}` : ''}${spof ? ', single point of failure' : ''}`;
  return (
    <G testID={`cable-${line.id}`} aria-label={label} aria-selected={selected}>
      {selected ? <Line x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={INK.copperSoft} strokeWidth={style.width + 8} strokeLinecap="round" /> : null}
      {spof ? <Line testID={`spof-mark-${line.id}`} x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={INK.danger} strokeOpacity={0.55} strokeWidth={style.width + 6} strokeDasharray={SPOF_DASH} /> : null}
      <Line x1={line.a.x} y1={line.a.y} x2={line.b.x} y2={line.b.y} stroke={selected ? INK.copper : ink} strokeWidth={style.width} strokeDasharray={style.dash ?? undefined} />
      {detail ? (
        <G transform={`translate(${mid.x} ${mid.y})`} testID={`cable-tag-${line.id}`} aria-label={`tag ${tag}`}>
          <CableTagMark tag={tag} ink={ink} />
        </G>
      ) : null}
      {spof ? <SpofMarker x={mid.x + 14} y={mid.y - 22} /> : null}
    </G>
  );
});

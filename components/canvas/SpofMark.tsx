import { memo } from 'react';
import { G, Path, Rect, Text } from 'react-native-svg';
import { HATCH_ID, INK, SPOF_DASH, spofMarkerPath } from '@/lib/editor/drawing';
import { fonts } from '@/components/ui';

/** The warning triangle with "!" that marks a single point of failure; its tip at (x, y). */
export function SpofMarker({ x, y }: { x: number; y: number }) {
  return (
    <>
      <Path d={spofMarkerPath(x, y)} fill={INK.danger} stroke={INK.surface} strokeWidth={1.5} />
      <Text x={x} y={y + 14} fontSize={11} fontFamily={fonts.bold} fill={INK.onDark} textAnchor="middle">
        !
      </Text>
    </>
  );
}

type OutlineProps = { unitId: string; x: number; y: number; width: number; height: number };

/**
 * A unit that is a single point of failure: a hatched, dashed outline around it and the marker on
 * its top-left corner — shape and pattern, so it reads without colour.
 */
export const SpofOutline = memo(function SpofOutline({ unitId, x, y, width, height }: OutlineProps) {
  return (
    <G testID={`spof-mark-${unitId}`} aria-label="single point of failure" pointerEvents="none">
      <Rect x={x - 3} y={y - 3} width={width + 6} height={height + 6} rx={6} fill={`url(#${HATCH_ID})`} stroke={INK.danger} strokeWidth={2.5} strokeDasharray={SPOF_DASH} />
      <SpofMarker x={x + 4} y={y - 12} />
    </G>
  );
});

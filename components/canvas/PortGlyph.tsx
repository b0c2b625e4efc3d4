import { memo } from 'react';
import { G, Path, Rect, Text } from 'react-native-svg';
import { INK, portCaption, portPath, portRailPath } from '@/lib/editor/drawing';
import type { LocalPort } from '@/lib/editor/shape';
import { fonts } from '@/components/ui';

type PortGlyphProps = { port: LocalPort; cabled: boolean; selected: boolean; pending: boolean; detail?: boolean };

/**
 * One port: its outline (an RJ45 latch notch or an SFP cage rail), filled when a cable is on it,
 * its name inside, and an invisible 44 px tap target around it. Management ports have a dashed
 * copper outline. The selected port gets a heavy ring; the start of a cable being drawn a dashed one.
 */
export const PortGlyph = memo(function PortGlyph({ port, cabled, selected, pending, detail = true }: PortGlyphProps) {
  const management = port.role === 'management';
  const rail = portRailPath(port.connector, port.rect);
  const { target, rect } = port;
  const caption = portCaption(port.name);
  return (
    <G testID={`port-${port.id}`} aria-label={`port ${port.name}${cabled ? ', cabled' : ''}`}>
      <Rect x={target.x} y={target.y} width={target.width} height={target.height} fill="transparent" />
      {selected || pending ? (
        <Rect
          x={rect.x - 4}
          y={rect.y - 4}
          width={rect.width + 8}
          height={rect.height + 8}
          rx={5}
          fill={pending ? INK.copperSoft : 'none'}
          stroke={INK.copper}
          strokeWidth={selected ? 3 : 2}
          strokeDasharray={pending && !selected ? '4 3' : undefined}
        />
      ) : null}
      <Path
        d={portPath(port.connector, rect)}
        fill={cabled ? INK.primarySoft : INK.surface}
        stroke={management ? INK.copper : INK.inkMuted}
        strokeWidth={cabled ? 1.6 : 1.2}
        strokeDasharray={management ? '3 2' : undefined}
      />
      {rail ? <Path d={rail} stroke={INK.inkMuted} strokeWidth={1} /> : null}
      {detail ? (
        <Text x={port.anchor.x} y={port.anchor.y + 4} fontSize={caption.size} fontFamily={fonts.regular} fill={INK.ink} textAnchor="middle">
          {caption.text}
        </Text>
      ) : null}
    </G>
  );
});

import { View } from 'react-native';
import Svg, { G, Path, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts } from '@/components/ui';
import type { CableDrawingModel, DrawnDevice } from '@/lib/schedule/drawing';

/**
 * The two devices of one cable as front panels, one above the other, every port a small square and
 * the two the cable plugs into filled copper and joined by the cable's line. Our own shapes.
 */
const WIDTH = 360;
const MARGIN = 12;
const CELL = 14;
const BOX = 10;
const HEADER = 24;
const GROUP_GAP = 8;
const PANEL_GAP = 44;
const PER_ROW = Math.floor((WIDTH - 2 * MARGIN - 8) / CELL);

type Placed = { x: number; y: number; lit: boolean; id: string; name: string };
type Panel = { device: DrawnDevice; y: number; height: number; ports: Placed[]; groupLabels: { x: number; y: number; text: string }[] };

function layoutPanel(device: DrawnDevice, top: number): Panel {
  const ports: Placed[] = [];
  const groupLabels: Panel['groupLabels'] = [];
  let y = top + HEADER;
  for (const group of device.groups) {
    if (group.name !== null) {
      groupLabels.push({ x: MARGIN + 6, y: y + 10, text: group.name });
      y += 14;
    }
    group.ports.forEach((port, i) => {
      const col = i % PER_ROW;
      const row = Math.floor(i / PER_ROW);
      ports.push({ x: MARGIN + 6 + col * CELL, y: y + row * CELL, lit: port.lit, id: port.id, name: port.name });
    });
    y += Math.max(1, Math.ceil(group.ports.length / PER_ROW)) * CELL + GROUP_GAP;
  }
  return { device, y: top, height: y - top, ports, groupLabels };
}

function PanelView({ panel, testID }: { panel: Panel; testID: string }) {
  return (
    <G testID={testID}>
      <Rect x={MARGIN} y={panel.y} width={WIDTH - 2 * MARGIN} height={panel.height} rx={6} fill={colors.surfaceSunken} stroke={colors.lineStrong} strokeWidth={1} />
      <SvgText x={MARGIN + 6} y={panel.y + 16} fontSize={13} fontFamily={fonts.semibold} fill={colors.ink}>
        {`${panel.device.name} (${panel.device.kind})`}
      </SvgText>
      {panel.groupLabels.map((label, i) => (
        <SvgText key={i} x={label.x} y={label.y} fontSize={11} fontFamily={fonts.regular} fill={colors.inkMuted}>
          {label.text}
        </SvgText>
      ))}
      {panel.ports.map((port) => (
        <Rect
          key={port.id}
          testID={port.lit ? `${testID}-lit` : undefined}
          x={port.x}
          y={port.y}
          width={BOX}
          height={BOX}
          rx={2}
          fill={port.lit ? colors.copper : colors.surface}
          stroke={port.lit ? colors.ink : colors.lineStrong}
          strokeWidth={port.lit ? 2 : 1}
        />
      ))}
    </G>
  );
}

export function CableDrawing({ model, label }: { model: CableDrawingModel; label: string }) {
  const near = layoutPanel(model.near, MARGIN);
  const far = layoutPanel(model.far, near.y + near.height + PANEL_GAP);
  const height = far.y + far.height + MARGIN;
  const a = near.ports.find((p) => p.lit);
  const b = far.ports.find((p) => p.lit);
  const mid = near.y + near.height + PANEL_GAP / 2;
  const litName = (panel: Panel) => panel.ports.find((p) => p.lit)?.name ?? '';
  const description = `Drawing: ${model.near.name} port ${litName(near)} cabled to ${model.far.name} port ${litName(far)}`;
  return (
    <View role="img" aria-label={description} accessibilityLabel={description} testID="cable-drawing" style={{ width: '100%', maxWidth: 520, aspectRatio: WIDTH / height }}>
      <Svg width="100%" height="100%" viewBox={`0 0 ${WIDTH} ${height}`}>
        {a && b ? (
          // Drawn first: the opaque panels cover it, so the cable shows in the gap, leaving each marked port.
          <Path d={`M${a.x + BOX / 2} ${a.y + BOX / 2}V${mid}H${b.x + BOX / 2}V${b.y + BOX / 2}`} stroke={colors.copper} strokeWidth={3} strokeLinejoin="round" fill="none" />
        ) : null}
        <PanelView panel={near} testID="cable-drawing-near" />
        <PanelView panel={far} testID="cable-drawing-far" />
        {a && b ? (
          <SvgText x={WIDTH - MARGIN - 4} y={mid - 6} fontSize={12} fontFamily={fonts.semibold} fill={colors.copper} textAnchor="end">
            {label}
          </SvgText>
        ) : null}
      </Svg>
    </View>
  );
}

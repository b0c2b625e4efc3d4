import type { ReactNode } from 'react';
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { colors, type ColorName } from '@/components/ui/tokens';

/** Line icons drawn for Cablewright on a 24-unit grid; decorative, so hidden from assistive tech. */
export type IconName = 'designs' | 'team' | 'account' | 'mailbox' | 'signOut' | 'info' | 'warning' | 'error' | 'success' | 'chevron' | 'back' | 'lock'
  | 'tick' | 'search' | 'download' | 'upload' | 'print' | 'compare' | 'unplugged'
  | 'site' | 'camera' | 'undo' | 'clock';

type IconProps = { name: IconName; size?: number; color?: ColorName | string };

export function Icon({ name, size = 22, color = 'ink' }: IconProps) {
  const stroke = color in colors ? colors[color as ColorName] : color;
  const common = { stroke, strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden focusable={false}>
      {drawings[name](common)}
    </Svg>
  );
}

type Common = { stroke: string; strokeWidth: number; fill: 'none'; strokeLinecap: 'round'; strokeLinejoin: 'round' };

const drawings: Record<IconName, (p: Common) => ReactNode> = {
  // Two devices joined by a cable: the product's own mark for a design.
  designs: (p) => (
    <>
      <Rect x={3} y={4} width={7} height={6} rx={1.5} {...p} />
      <Rect x={14} y={14} width={7} height={6} rx={1.5} {...p} />
      <Path d="M6.5 10v4.5a2.5 2.5 0 0 0 2.5 2.5h5" {...p} />
      <Path d="M17.5 14V9.5A2.5 2.5 0 0 0 15 7h-5" {...p} />
    </>
  ),
  team: (p) => (
    <>
      <Circle cx={9} cy={8} r={3.2} {...p} />
      <Path d="M3 19.5c.6-3.2 3-5 6-5s5.4 1.8 6 5" {...p} />
      <Circle cx={17} cy={9} r={2.4} {...p} />
      <Path d="M16.5 14.2c2.3.2 4 1.6 4.5 4.3" {...p} />
    </>
  ),
  account: (p) => (
    <>
      <Circle cx={12} cy={8.5} r={3.6} {...p} />
      <Path d="M4.5 20c.8-3.8 3.7-6 7.5-6s6.7 2.2 7.5 6" {...p} />
    </>
  ),
  mailbox: (p) => (
    <>
      <Rect x={3} y={5.5} width={18} height={13} rx={2} {...p} />
      <Path d="M3.5 7l8.5 6.2L20.5 7" {...p} />
    </>
  ),
  signOut: (p) => (
    <>
      <Path d="M14 4.5H6.5a1.5 1.5 0 0 0-1.5 1.5v12a1.5 1.5 0 0 0 1.5 1.5H14" {...p} />
      <Path d="M10.5 12h9.5M16.5 8.5 20 12l-3.5 3.5" {...p} />
    </>
  ),
  info: (p) => (
    <>
      <Circle cx={12} cy={12} r={9} {...p} />
      <Path d="M12 11v5.5M12 7.6v.2" {...p} />
    </>
  ),
  warning: (p) => (
    <>
      <Path d="M12 3.8 21 19.5H3z" {...p} />
      <Path d="M12 10v4.2M12 16.8v.2" {...p} />
    </>
  ),
  error: (p) => (
    <>
      <Path d="M8.3 3.5h7.4l5.3 5.3v6.4l-5.3 5.3H8.3L3 15.2V8.8z" {...p} />
      <Path d="M9.5 9.5l5 5M14.5 9.5l-5 5" {...p} />
    </>
  ),
  success: (p) => (
    <>
      <Circle cx={12} cy={12} r={9} {...p} />
      <Path d="M7.8 12.3l2.8 2.8 5.6-5.8" {...p} />
    </>
  ),
  chevron: (p) => <Path d="M9.5 6l6 6-6 6" {...p} />,
  back: (p) => <Path d="M14.5 6l-6 6 6 6" {...p} />,
  lock: (p) => (
    <>
      <Rect x={5} y={10.5} width={14} height={9.5} rx={2} {...p} />
      <Path d="M8.5 10.5V8a3.5 3.5 0 0 1 7 0v2.5" {...p} />
    </>
  ),
  tick: (p) => <Path d="M5.5 12.5l4.2 4.2 8.8-9.2" {...p} />,
  search: (p) => (
    <>
      <Circle cx={10.5} cy={10.5} r={6} {...p} />
      <Path d="M15 15l5 5" {...p} />
    </>
  ),
  download: (p) => (
    <>
      <Path d="M12 4v11M7.5 10.5 12 15l4.5-4.5" {...p} />
      <Path d="M4.5 18.5h15" {...p} />
    </>
  ),
  upload: (p) => (
    <>
      <Path d="M12 15V4M7.5 8.5 12 4l4.5 4.5" {...p} />
      <Path d="M4.5 18.5h15" {...p} />
    </>
  ),
  print: (p) => (
    <>
      <Rect x={7} y={3.5} width={10} height={5} rx={1} {...p} />
      <Rect x={4} y={8.5} width={16} height={8} rx={2} {...p} />
      <Rect x={7} y={13.5} width={10} height={7} rx={1} {...p} />
    </>
  ),
  // Two versions side by side with arrows between them.
  compare: (p) => (
    <>
      <Rect x={3} y={4} width={7} height={16} rx={1.5} {...p} />
      <Rect x={14} y={4} width={7} height={16} rx={1.5} {...p} />
      <Path d="M10.5 9h3M12.5 7.5 14 9l-1.5 1.5M13.5 15h-3M11.5 13.5 10 15l1.5 1.5" {...p} />
    </>
  ),
  // A cable end pulled away from its socket, with a break between them.
  unplugged: (p) => (
    <>
      <Path d="M3 12h5M8 8.5v7M8 10h3M8 14h3" {...p} />
      <Path d="M21 12h-5M16 8.5v7" {...p} />
      <Path d="M12.8 8.8l1 1.4M12.8 15.2l1-1.4" {...p} />
    </>
  ),
  // A rack with a clipboard tick: work on site.
  site: (p) => (
    <>
      <Rect x={4} y={3} width={10} height={18} rx={1.5} {...p} />
      <Path d="M7 7h4M7 11h4M7 15h4" {...p} />
      <Path d="M15.5 15.5l2 2 3.5-4" {...p} />
    </>
  ),
  camera: (p) => (
    <>
      <Path d="M4 8h3l1.6-2.5h6.8L17 8h3v11H4z" {...p} />
      <Circle cx={12} cy={13} r={3.4} {...p} />
    </>
  ),
  // A curved arrow turning back: take the last mark back.
  undo: (p) => (
    <>
      <Path d="M8 6.5 4.5 10 8 13.5" {...p} />
      <Path d="M5 10h9a5 5 0 0 1 0 10h-3" {...p} />
    </>
  ),
  clock: (p) => (
    <>
      <Circle cx={12} cy={12} r={9} {...p} />
      <Path d="M12 7.5V12l3 2" {...p} />
    </>
  ),
};

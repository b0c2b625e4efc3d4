import type { ReactNode } from 'react';
import Svg, { Circle, Path, Rect } from 'react-native-svg';
import { colors, type ColorName } from '@/components/ui';

/** The editor's line icons, drawn for Cablewright on the design system's 24-unit grid. */
export type EditorIconName =
  | 'undo' | 'redo' | 'zoomIn' | 'zoomOut' | 'fit' | 'arrange' | 'help' | 'export' | 'save' | 'trash'
  | 'plus' | 'minus' | 'close' | 'findings' | 'networks' | 'canvas' | 'back' | 'add' | 'pan' | 'tag';

type P = { stroke: string; strokeWidth: number; fill: 'none'; strokeLinecap: 'round'; strokeLinejoin: 'round' };

const drawings: Record<EditorIconName, (p: P) => ReactNode> = {
  undo: (p) => <Path d="M9 7H4v5M4.5 11.5C6 8 9 6 12.5 6c4 0 7 3 7 7s-3 7-7 7H9" {...p} />,
  redo: (p) => <Path d="M15 7h5v5M19.5 11.5C18 8 15 6 11.5 6c-4 0-7 3-7 7s3 7 7 7H15" {...p} />,
  zoomIn: (p) => (
    <>
      <Circle cx={10.5} cy={10.5} r={6.5} {...p} />
      <Path d="M15.5 15.5 20 20M8 10.5h5M10.5 8v5" {...p} />
    </>
  ),
  zoomOut: (p) => (
    <>
      <Circle cx={10.5} cy={10.5} r={6.5} {...p} />
      <Path d="M15.5 15.5 20 20M8 10.5h5" {...p} />
    </>
  ),
  fit: (p) => <Path d="M4 9V4h5M15 4h5v5M20 15v5h-5M9 20H4v-5M8.5 8.5h7v7h-7z" {...p} />,
  arrange: (p) => (
    <>
      <Rect x={3} y={3.5} width={7} height={4.5} rx={1} {...p} />
      <Rect x={14} y={3.5} width={7} height={4.5} rx={1} {...p} />
      <Rect x={8.5} y={16} width={7} height={4.5} rx={1} {...p} />
      <Path d="M6.5 8v2.5h11V8M12 10.5V16" {...p} />
    </>
  ),
  help: (p) => (
    <>
      <Circle cx={12} cy={12} r={9} {...p} />
      <Path d="M9.5 9.5a2.6 2.6 0 1 1 3.6 2.4c-.7.3-1.1.9-1.1 1.6v.6M12 16.8v.2" {...p} />
    </>
  ),
  export: (p) => <Path d="M12 3.5v11M7.5 10 12 14.5 16.5 10M4.5 16v3.5h15V16" {...p} />,
  save: (p) => <Path d="M5 4h11l3 3v13H5zM8 4v5h7V4M8 20v-6h8v6" {...p} />,
  trash: (p) => <Path d="M4.5 7h15M9.5 7V4.5h5V7M6.5 7l1 13h9l1-13M10 11v5.5M14 11v5.5" {...p} />,
  plus: (p) => <Path d="M12 5v14M5 12h14" {...p} />,
  minus: (p) => <Path d="M5 12h14" {...p} />,
  close: (p) => <Path d="M6 6l12 12M18 6 6 18" {...p} />,
  findings: (p) => <Path d="M12 3.8 21 19.5H3zM12 10v4.2M12 16.8v.2" {...p} />,
  networks: (p) => (
    <>
      <Circle cx={12} cy={5.5} r={2.5} {...p} />
      <Circle cx={5} cy={18} r={2.5} {...p} />
      <Circle cx={19} cy={18} r={2.5} {...p} />
      <Path d="M12 8v4M12 12l-5.5 4M12 12l5.5 4" {...p} />
    </>
  ),
  canvas: (p) => (
    <>
      <Rect x={3} y={4} width={7} height={6} rx={1.5} {...p} />
      <Rect x={14} y={14} width={7} height={6} rx={1.5} {...p} />
      <Path d="M10 7h4.5a2 2 0 0 1 2 2v5" {...p} />
    </>
  ),
  back: (p) => <Path d="M14.5 6l-6 6 6 6" {...p} />,
  add: (p) => (
    <>
      <Rect x={3.5} y={3.5} width={17} height={17} rx={3} {...p} />
      <Path d="M12 8v8M8 12h8" {...p} />
    </>
  ),
  // A luggage tag: a cable's printed label.
  tag: (p) => <Path d="M4 4h8l8 8-8 8-8-8zM8.5 8.5v.01" {...p} />,
  pan: (p) => <Path d="M12 3v18M3 12h18M12 3l-2.5 2.5M12 3l2.5 2.5M12 21l-2.5-2.5M12 21l2.5-2.5M3 12l2.5-2.5M3 12l2.5 2.5M21 12l-2.5-2.5M21 12l-2.5 2.5" {...p} />,
};

export function EditorIcon({ name, size = 22, color = 'ink' }: { name: EditorIconName; size?: number; color?: ColorName }) {
  const common = { stroke: colors[color], strokeWidth: 1.8, fill: 'none', strokeLinecap: 'round', strokeLinejoin: 'round' } as const;
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden focusable={false}>
      {drawings[name](common)}
    </Svg>
  );
}

import { memo } from 'react';
import Svg, { Path, Rect } from 'react-native-svg';
import { qrPath } from '@/lib/labels/qr-path';

/** A cable label's QR code (quiet zone included), `sizePx` on a side. */
export const LabelQr = memo(function LabelQr({ text, sizePx, testID }: { text: string; sizePx: number; testID?: string }) {
  const { path, size } = qrPath(text);
  return (
    <Svg width={sizePx} height={sizePx} viewBox={`0 0 ${size} ${size}`} testID={testID} aria-hidden focusable={false}>
      <Rect x={0} y={0} width={size} height={size} fill="#ffffff" />
      <Path d={path} fill="#000000" />
    </Svg>
  );
});

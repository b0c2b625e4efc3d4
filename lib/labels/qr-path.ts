import { qrMatrix, QR_QUIET_ZONE_MODULES } from '@/shared/labels/qr';

/**
 * A QR code as one SVG path (a 1 × 1 square per dark module) on a grid with the quiet zone around
 * it: what the label sheet draws with react-native-svg, and what the decoding test reads back.
 */
export function qrPath(text: string): { path: string; size: number } {
  const { size, dark } = qrMatrix(text);
  const q = QR_QUIET_ZONE_MODULES;
  const parts: string[] = [];
  for (let y = 0; y < size; y += 1) {
    for (let x = 0; x < size; x += 1) {
      if (dark[y * size + x]) parts.push(`M${x + q} ${y + q}h1v1h-1z`);
    }
  }
  return { path: parts.join(''), size: size + 2 * q };
}

import QRCode from 'qrcode';

/**
 * QR codes for cable labels (the qrcode package), in the browser and on the server alike.
 * Error correction level M (about 15 % of the code may be damaged — ISO/IEC 18004, from memory):
 * labels get scuffed in a rack. The quiet zone is the 4 modules the standard asks for.
 */
const OPTIONS = { errorCorrectionLevel: 'M', margin: 4 } as const;

/** The QR code as an SVG document (dark modules as one path), scaled by whoever draws it. */
export function qrSvg(text: string): Promise<string> {
  return QRCode.toString(text, { ...OPTIONS, type: 'svg' });
}

/** The modules themselves, row by row (true = dark), for drawing with other tools (react-native-svg, PDF). */
export function qrMatrix(text: string): { size: number; dark: boolean[] } {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: OPTIONS.errorCorrectionLevel });
  return { size: modules.size, dark: Array.from(modules.data, (bit) => bit === 1) };
}

export const QR_QUIET_ZONE_MODULES = OPTIONS.margin;

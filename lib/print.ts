import { Platform } from 'react-native';

/**
 * Print layout for report screens. The app is one full-height scrolling page, which a browser
 * would print as a single clipped screenful; when printing, every box grows to its content and
 * the navigation (sidebar, top bar, tab bar) and on-screen controls marked `data-print="hide"`
 * are left out.
 */
const STYLE_ID = 'cablewright-print';

const PRINT_CSS = `
@media print {
  @page { margin: 14mm; }
  html, body, #root { height: auto !important; overflow: visible !important; background: #fff !important; }
  #root div { overflow: visible !important; max-height: none !important; }
  [data-testid="nav-sidebar"], [data-testid="nav-tabs"], [data-testid="top-bar"], [data-print="hide"] { display: none !important; }
  [data-print="keep"] { break-inside: avoid; }
}`;

export function installPrintStyles(): void {
  if (Platform.OS !== 'web' || typeof document === 'undefined' || document.getElementById(STYLE_ID)) return;
  const style = document.createElement('style');
  style.id = STYLE_ID;
  style.textContent = PRINT_CSS;
  document.head.appendChild(style);
}

export function printPage(): boolean {
  if (Platform.OS !== 'web' || typeof window === 'undefined' || typeof window.print !== 'function') return false;
  window.print();
  return true;
}

/** react-native-web turns `dataSet` into data-* attributes; React Native's own types do not list it. */
export function printHidden(): object {
  return { dataSet: { print: 'hide' } };
}

export function printKeepTogether(): object {
  return { dataSet: { print: 'keep' } };
}

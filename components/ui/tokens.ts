/**
 * Cablewright's own palette: deep teal ink on warm paper, with copper for emphasis.
 * Every text/background pair used by the components is listed in `contrastPairs` and held to
 * WCAG 2.1 AA (4.5:1 for text, 3:1 for borders of controls) by a test.
 */
export const colors = {
  ink: '#0f3d3e',
  inkMuted: '#4f5e5c',
  paper: '#f6f5f1',
  surface: '#fffdf9',
  surfaceSunken: '#efece4',
  line: '#d8d2c4',
  lineStrong: '#8a8272',
  primary: '#14595b',
  primaryPressed: '#0f4647',
  primarySoft: '#e6efed',
  onPrimary: '#ffffff',
  copper: '#9a4a22',
  copperSoft: '#f3c9a5',
  sidebar: '#0f3d3e',
  sidebarActive: '#1b5253',
  onSidebar: '#f6f5f1',
  onSidebarMuted: '#b7c9c6',
  danger: '#a3271f',
  dangerPressed: '#861f18',
  dangerText: '#9e2a20',
  dangerSoft: '#f9e5e1',
  warningText: '#7a4f00',
  warningSoft: '#fbf1dc',
  successText: '#2d6a3a',
  successSoft: '#e7f2e6',
  infoText: '#1d5470',
  infoSoft: '#e3eef3',
  focus: '#9a4a22',
} as const;
export type ColorName = keyof typeof colors;

/** [foreground, background, minimum ratio] for every pairing the components draw. */
export const contrastPairs: readonly [ColorName, ColorName, number][] = [
  ['ink', 'paper', 4.5],
  ['ink', 'surface', 4.5],
  ['ink', 'surfaceSunken', 4.5],
  ['inkMuted', 'paper', 4.5],
  ['inkMuted', 'surface', 4.5],
  ['onPrimary', 'primary', 4.5],
  ['onPrimary', 'primaryPressed', 4.5],
  ['primary', 'primarySoft', 4.5],
  ['primary', 'surface', 4.5],
  ['copper', 'surface', 4.5],
  ['copper', 'paper', 4.5],
  ['onPrimary', 'danger', 4.5],
  ['dangerText', 'surface', 4.5],
  ['dangerText', 'dangerSoft', 4.5],
  ['warningText', 'warningSoft', 4.5],
  ['successText', 'successSoft', 4.5],
  ['infoText', 'infoSoft', 4.5],
  ['onSidebar', 'sidebar', 4.5],
  ['onSidebar', 'sidebarActive', 4.5],
  ['onSidebarMuted', 'sidebar', 4.5],
  ['copperSoft', 'sidebar', 4.5],
  ['lineStrong', 'surface', 3],
  // Site work: the ghost buttons of a safety caution row.
  ['primary', 'warningSoft', 4.5],
];

/** A 4-point spacing scale. */
export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radius = { sm: 6, md: 10, lg: 14, pill: 999 } as const;

/** Tap targets: at least 44×44 px (WCAG 2.1 SC 2.5.5). */
export const TAP_TARGET = 44;

/** Layout switches from bottom tabs to a sidebar at this window width. */
export const WIDE_BREAKPOINT = 1024;

/** Reading width for screen content on wide windows. */
export const CONTENT_MAX_WIDTH = 880;

export const fonts = {
  regular: 'Inter_400Regular',
  semibold: 'Inter_600SemiBold',
  bold: 'Inter_700Bold',
} as const;

/** Type scale: size / line height pairs; body text is 16 px so phones need no zoom. */
export const type = {
  display: { fontSize: 28, lineHeight: 36, fontFamily: fonts.bold },
  title: { fontSize: 22, lineHeight: 30, fontFamily: fonts.bold },
  heading: { fontSize: 18, lineHeight: 26, fontFamily: fonts.semibold },
  body: { fontSize: 16, lineHeight: 24, fontFamily: fonts.regular },
  bodyStrong: { fontSize: 16, lineHeight: 24, fontFamily: fonts.semibold },
  small: { fontSize: 14, lineHeight: 20, fontFamily: fonts.regular },
  smallStrong: { fontSize: 14, lineHeight: 20, fontFamily: fonts.semibold },
  label: { fontSize: 15, lineHeight: 22, fontFamily: fonts.semibold },
  caption: { fontSize: 13, lineHeight: 18, fontFamily: fonts.regular },
} as const;
export type TypeVariant = keyof typeof type;

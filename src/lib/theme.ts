import { useColorScheme, useWindowDimensions } from 'react-native';

/**
 * Probepath's design tokens. Two palettes: "bright workshop" for strong shop
 * lights and "dim corner" for a dark bay; the system colour scheme picks one.
 * Every text colour meets 4.5:1 on the surfaces it sits on (7:1 for `text`),
 * proven by test/unit/theme-contrast.test.ts.
 */
export interface Palette {
  background: string;
  surface: string;
  surfaceSunken: string;
  border: string;
  /** Input outlines and other non-text UI that must reach 3:1. */
  borderStrong: string;
  text: string;
  textMuted: string;
  primary: string;
  onPrimary: string;
  primarySoft: string;
  danger: string;
  onDanger: string;
  dangerSoft: string;
  success: string;
  successSoft: string;
  warning: string;
  warningSoft: string;
  /** The shell's sidebar and phone header. */
  chrome: string;
  onChrome: string;
  onChromeMuted: string;
  chromeSelected: string;
  /** The probe-tip amber that marks where you are and where focus is. */
  signal: string;
}

const brightWorkshop: Palette = {
  background: '#F4F1EA',
  surface: '#FFFFFF',
  surfaceSunken: '#EAE5DA',
  border: '#D6CFC0',
  borderStrong: '#7A7163',
  text: '#14202B',
  textMuted: '#4A5260',
  primary: '#0B5D5A',
  onPrimary: '#FFFFFF',
  primarySoft: '#DCEDEA',
  danger: '#A3261B',
  onDanger: '#FFFFFF',
  dangerSoft: '#F8E1DD',
  success: '#1D6B32',
  successSoft: '#DDF0E1',
  warning: '#8A5300',
  warningSoft: '#FBEBCF',
  chrome: '#14202B',
  onChrome: '#F4F1EA',
  onChromeMuted: '#B7BFC9',
  chromeSelected: '#26394B',
  signal: '#E8A33D',
};

const dimCorner: Palette = {
  background: '#0F1419',
  surface: '#18202A',
  surfaceSunken: '#0B0F13',
  border: '#2C3744',
  borderStrong: '#8493A3',
  text: '#ECE8DF',
  textMuted: '#AEB6C0',
  primary: '#5FC7BE',
  onPrimary: '#0B1A1A',
  primarySoft: '#173836',
  danger: '#FF8A7A',
  onDanger: '#2A0A06',
  dangerSoft: '#3A1A16',
  success: '#7FD491',
  successSoft: '#173321',
  warning: '#F2B85B',
  warningSoft: '#3A2C12',
  chrome: '#0B0F13',
  onChrome: '#ECE8DF',
  onChromeMuted: '#AEB6C0',
  chromeSelected: '#1F2B38',
  signal: '#F2B85B',
};

export const palettes = { light: brightWorkshop, dark: dimCorner } as const;

export const fonts = {
  regular: 'AtkinsonHyperlegibleNext-Regular',
  semiBold: 'AtkinsonHyperlegibleNext-SemiBold',
  bold: 'AtkinsonHyperlegibleNext-Bold',
  mono: 'JetBrainsMono-Medium',
  monoBold: 'JetBrainsMono-Bold',
} as const;

/** Body text is never under 17 px; readings are at least 40 px for arm's length. */
export const type = {
  label: { fontFamily: fonts.semiBold, fontSize: 14, lineHeight: 18 },
  small: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 22 },
  body: { fontFamily: fonts.regular, fontSize: 17, lineHeight: 25 },
  bodyStrong: { fontFamily: fonts.semiBold, fontSize: 17, lineHeight: 25 },
  title: { fontFamily: fonts.bold, fontSize: 21, lineHeight: 28 },
  heading: { fontFamily: fonts.bold, fontSize: 28, lineHeight: 34 },
  display: { fontFamily: fonts.bold, fontSize: 34, lineHeight: 40 },
  mono: { fontFamily: fonts.mono, fontSize: 17, lineHeight: 24 },
  reading: { fontFamily: fonts.monoBold, fontSize: 44, lineHeight: 52 },
} as const;

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

export const layout = {
  maxContentWidth: 1120,
  maxFormWidth: 520,
  sidebarWidth: 264,
  /** Smallest touch target; primary actions are taller. */
  minTouch: 44,
  primaryTouch: 48,
} as const;

/** Wide: the shell swaps bottom tabs for a sidebar. Desk: lists become tables, panes sit side by side. */
export const BREAKPOINTS = { wide: 800, desk: 1200 } as const;

export function useBreakpoints() {
  const { width } = useWindowDimensions();
  return { width, isWide: width >= BREAKPOINTS.wide, isDesk: width >= BREAKPOINTS.desk };
}

export function useTheme(): Palette {
  return useColorScheme() === 'dark' ? palettes.dark : palettes.light;
}

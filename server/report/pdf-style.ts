import path from 'node:path';

/** The report's look on paper: Probepath's print palette and the fonts the app ships. */
export const PDF_COLOURS = {
  text: '#14202B',
  muted: '#4A5260',
  primary: '#0B5D5A',
  primarySoft: '#DCEDEA',
  border: '#B9B1A2',
  rule: '#D6CFC0',
  track: '#EAE5DA',
  window: '#1D6B32',
  windowFill: '#BFE3C8',
  bandFill: '#F2C879',
  overFill: '#F8E1DD',
  success: '#1D6B32',
  warning: '#8A5300',
  danger: '#A3261B',
} as const;

export const PDF_FONTS = {
  text: 'Text',
  semiBold: 'TextSemiBold',
  bold: 'TextBold',
  mono: 'Mono',
  monoBold: 'MonoBold',
} as const;

const FONT_DIR = path.resolve(__dirname, '../../fonts');

/** Font name → TTF: Atkinson Hyperlegible Next for text, JetBrains Mono for readings (both carry Ω, µ and ±). */
export const PDF_FONT_FILES: Record<string, string> = {
  [PDF_FONTS.text]: path.join(FONT_DIR, 'AtkinsonHyperlegibleNext-Regular.ttf'),
  [PDF_FONTS.semiBold]: path.join(FONT_DIR, 'AtkinsonHyperlegibleNext-SemiBold.ttf'),
  [PDF_FONTS.bold]: path.join(FONT_DIR, 'AtkinsonHyperlegibleNext-Bold.ttf'),
  [PDF_FONTS.mono]: path.join(FONT_DIR, 'JetBrainsMono-Medium.ttf'),
  [PDF_FONTS.monoBold]: path.join(FONT_DIR, 'JetBrainsMono-Bold.ttf'),
};

/**
 * Text for the Atkinson faces: they draw the micro prefix only as the Greek
 * letter mu (U+03BC), which looks the same, not as the micro sign (U+00B5).
 */
export const pdfText = (s: string) => s.replace(/\u00B5/g, '\u03BC');

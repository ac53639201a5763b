import { describe, expect, it, vi } from 'vitest';

// theme.ts also exports hooks built on react-native; its palettes are plain data.
vi.mock('react-native', () => ({}));
const { palettes } = await import('@/lib/theme');
type Palette = (typeof palettes)['light'];

/** WCAG 2.2 contrast ratio of two #RRGGBB colours. */
function contrast(a: string, b: string): number {
  const luminance = (hex: string) => {
    const [r, g, b2] = [1, 3, 5].map((i) => {
      const c = parseInt(hex.slice(i, i + 2), 16) / 255;
      return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
    });
    return 0.2126 * r + 0.7152 * g + 0.0722 * b2;
  };
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

type Key = keyof Palette;
// [foreground, background, minimum]: 7:1 for body text (readings and verdicts use it),
// 4.5:1 for all other text (WCAG 1.4.3), 3:1 for outlines and markers (WCAG 1.4.11).
const pairs: [Key, Key, number][] = [
  ['text', 'background', 7],
  ['text', 'surface', 7],
  ['text', 'surfaceSunken', 7],
  ['text', 'primarySoft', 7],
  ['text', 'dangerSoft', 7],
  ['textMuted', 'background', 4.5],
  ['textMuted', 'surface', 4.5],
  ['textMuted', 'surfaceSunken', 4.5],
  ['textMuted', 'primarySoft', 4.5],
  ['primary', 'background', 4.5],
  ['primary', 'surface', 4.5],
  ['primary', 'primarySoft', 4.5],
  ['onPrimary', 'primary', 4.5],
  ['onDanger', 'danger', 4.5],
  ['danger', 'background', 4.5],
  ['danger', 'surface', 4.5],
  ['danger', 'dangerSoft', 4.5],
  ['success', 'surface', 4.5],
  ['success', 'successSoft', 4.5],
  ['warning', 'surface', 4.5],
  ['warning', 'warningSoft', 4.5],
  ['onChrome', 'chrome', 7],
  ['onChrome', 'chromeSelected', 4.5],
  ['onChromeMuted', 'chrome', 4.5],
  ['borderStrong', 'surface', 3],
  ['borderStrong', 'background', 3],
  ['signal', 'chrome', 3],
];

describe.each(Object.entries(palettes))('the %s palette', (_name, palette) => {
  it.each(pairs)('%s on %s reaches %s:1', (fg, bg, minimum) => {
    expect(contrast(palette[fg], palette[bg])).toBeGreaterThanOrEqual(minimum);
  });
});

import fs from 'node:fs';
import path from 'node:path';

/** Text faces the first screen needs; the reading face loads when a check is shown. */
const PRELOADED_FONTS = /^AtkinsonHyperlegibleNext-(Regular|SemiBold|Bold)\.[0-9a-f]+\.ttf$/;

/**
 * The exported index.html with the first screen's fonts preloaded, so text does
 * not wait for the bundle to ask for them. Read once at start.
 */
export function prepareIndexHtml(webDir: string): string | null {
  const file = path.join(webDir, 'index.html');
  if (!fs.existsSync(file)) return null;
  const html = fs.readFileSync(file, 'utf8');
  const fontDir = path.join(webDir, 'assets', 'fonts');
  const fonts = fs.existsSync(fontDir) ? fs.readdirSync(fontDir).filter((f) => PRELOADED_FONTS.test(f)).sort() : [];
  const links = fonts.map((f) => `<link rel="preload" href="/assets/fonts/${f}" as="font" type="font/ttf" crossorigin>`).join('\n    ');
  const description = '<meta name="description" content="Probepath: guided electrical diagnosis for motorcycle, scooter and small-engine shops.">';
  return html.replace('</head>', `    ${description}\n    ${links}\n  </head>`);
}

import path from 'node:path';
import { Font } from '@react-pdf/renderer';

/**
 * react-pdf embeds TTF and WOFF 1 fonts; its subsetter fails on the WOFF 2 files in fonts/ (the
 * variable Inter and JetBrains Mono both stop with a glyph-offset error), so figures use the
 * WOFF 1 build of the same JetBrains Mono (OFL, licence beside it) and prose the built-in
 * Helvetica.
 */
const dir = path.join(process.cwd(), 'lib', 'atlas', 'pdf', 'fonts');
let registered = false;

export const PDF_MONO = 'JetBrains Mono';
export const PDF_SANS = 'Helvetica';

export function registerPdfFonts(): void {
  if (registered) return;
  Font.register({
    family: PDF_MONO,
    fonts: [
      { src: path.join(dir, 'jetbrains-mono-latin-400.woff'), fontWeight: 400 },
      { src: path.join(dir, 'jetbrains-mono-latin-700.woff'), fontWeight: 700 },
    ],
  });
  // Long words in narrow columns would otherwise be split with hyphens mid-unit.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}

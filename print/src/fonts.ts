import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Font } from '@react-pdf/renderer';
import { renamePostScript } from './sfnt-rename.js';
import { woffToSfnt } from './woff-to-sfnt.js';

const require = createRequire(import.meta.url);

/** Debian's fonts-dejavu-core: covers the math symbols (≤ ≥ √ Δ ·) the fontsource subsets lack. */
const DEJAVU_DIR = '/usr/share/fonts/truetype/dejavu';

/**
 * Font stacks. react-pdf picks, per glyph, the first family that has it: the fontsource latin
 * subsets first, then their latin-ext and greek subsets, then DejaVu Sans for math symbols.
 */
export const SANS = ['Inter', 'InterExt', 'InterGreek', 'HoldfastSymbols'];
export const MONO = ['JetBrainsMono', 'JetBrainsMonoExt', 'JetBrainsMonoGreek', 'HoldfastSymbols'];

let registered = false;

/**
 * A fontsource font as a data URL of its unpacked sfnt bytes, renamed `psName`. Only .woff:
 * react-pdf's subsetter crashes on some .woff2 glyphs; unpacked once because fontkit re-inflates
 * WOFF tables per glyph. `dropTables` removes OpenType substitutions where they only harm
 * (JetBrains Mono's code ligatures would print '->' or '>=' as one arrow glyph).
 */
function fontsource(pkg: string, file: string, psName: string, dropTables: string[] = []): string {
  const woff = readFileSync(require.resolve(`@fontsource/${pkg}/files/${file}`));
  const sfnt = renamePostScript(woffToSfnt(woff, dropTables), psName);
  return `data:font/ttf;base64,${sfnt.toString('base64')}`;
}

const WEIGHT_NAMES: Record<number, string> = { 400: 'Regular', 600: 'SemiBold', 700: 'Bold' };

/** Registers the PDF fonts once per process. Throws when a font file is missing. */
export function registerPdfFonts(): void {
  if (registered) return;
  const inter = (family: string, subset: string) =>
    Font.register({
      family,
      fonts: [400, 600, 700].map((w) => ({
        src: fontsource(
          'inter',
          `inter-${subset}-${w}-normal.woff`,
          `${family}-${WEIGHT_NAMES[w]}`,
          ['GSUB'],
        ),
        fontWeight: w,
      })),
    });
  const mono = (family: string, subset: string) =>
    Font.register({
      family,
      fonts: [400, 700].map((w) => ({
        src: fontsource(
          'jetbrains-mono',
          `jetbrains-mono-${subset}-${w}-normal.woff`,
          `${family}-${WEIGHT_NAMES[w]}`,
          ['GSUB'],
        ),
        fontWeight: w,
      })),
    });
  inter('Inter', 'latin');
  inter('InterExt', 'latin-ext');
  inter('InterGreek', 'greek');
  mono('JetBrainsMono', 'latin');
  mono('JetBrainsMonoExt', 'latin-ext');
  mono('JetBrainsMonoGreek', 'greek');
  const regular = `${DEJAVU_DIR}/DejaVuSans.ttf`;
  const bold = `${DEJAVU_DIR}/DejaVuSans-Bold.ttf`;
  if (!existsSync(regular)) {
    throw new Error(
      `PDF fonts: ${regular} is missing; install Debian's fonts-dejavu-core (apt-get install -y fonts-dejavu-core)`,
    );
  }
  Font.register({
    family: 'HoldfastSymbols',
    fonts: [
      { src: regular, fontWeight: 400 },
      { src: existsSync(bold) ? bold : regular, fontWeight: 600 },
      { src: existsSync(bold) ? bold : regular, fontWeight: 700 },
    ],
  });
  // Engineering words must not be split with hyphens the reader could take for minus signs.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}

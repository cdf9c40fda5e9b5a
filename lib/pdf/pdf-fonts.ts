import path from 'node:path';
import { Font } from '@react-pdf/renderer';

export const SANS = 'IBM Plex Sans';
export const MONO = 'IBM Plex Mono';
/**
 * Glyphs IBM Plex lacks but engine text uses (⊕, Ṁ, ⌈ ⌉, superscript minus
 * ⁻, ☉) come from DejaVu Sans (Bitstream Vera licence, public/fonts/LICENSE-DejaVu.txt),
 * chosen per character by react-pdf's font fallback.
 */
export const FALLBACK = 'DejaVu Sans';

/** Font stacks for styles: our face first, the fallback for missing glyphs. */
export const SANS_STACK = [SANS, FALLBACK];
export const MONO_STACK = [MONO, FALLBACK];

let registered = false;

/** Registers IBM Plex (OFL, public/fonts) with react-pdf once per process; TTF files embed, WOFF2 would not. */
export function registerPdfFonts(): void {
  if (registered) return;
  const dir = path.join(process.cwd(), 'public', 'fonts');
  const file = (name: string) => path.join(dir, name);
  Font.register({
    family: SANS,
    fonts: [
      { src: file('IBMPlexSans_400Regular.ttf'), fontWeight: 400 },
      { src: file('IBMPlexSans_400Regular_Italic.ttf'), fontWeight: 400, fontStyle: 'italic' },
      { src: file('IBMPlexSans_500Medium.ttf'), fontWeight: 500 },
      { src: file('IBMPlexSans_600SemiBold.ttf'), fontWeight: 600 },
      { src: file('IBMPlexSans_700Bold.ttf'), fontWeight: 700 },
    ],
  });
  Font.register({
    family: MONO,
    fonts: [
      { src: file('IBMPlexMono_400Regular.ttf'), fontWeight: 400 },
      { src: file('IBMPlexMono_500Medium.ttf'), fontWeight: 500 },
      { src: file('IBMPlexMono_600SemiBold.ttf'), fontWeight: 600 },
    ],
  });
  // One face serves every weight and style of the fallback: it only fills in the odd symbol.
  Font.register({
    family: FALLBACK,
    fonts: [
      { src: file('DejaVuSans.ttf'), fontWeight: 400 },
      { src: file('DejaVuSans.ttf'), fontWeight: 400, fontStyle: 'italic' },
    ],
  });
  // Words are not hyphenated: engineering terms and numbers read badly when split.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}

/**
 * Text for IBM Plex Mono. fontkit fails (RangeError) on that face's space
 * glyph (U+0020 and U+00A0 map to it); U+2007 FIGURE SPACE has the same
 * advance in a monospaced face, so spaces are swapped for it.
 */
export const monoText = (s: string): string => s.replace(/[ \u00a0]/g, '\u2007');

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

/** A fontkit font as far as shaping goes (react-pdf's font store holds these as `data`). */
interface ShapingFont {
  layout(text: string, features?: unknown, script?: string, language?: string, direction?: string): unknown;
}

const UNCACHED_LAYOUT = Symbol.for('nodewright.pdf.uncachedLayout');
/** Per font; cleared when full, which a long memo's distinct strings do not reach. */
const SHAPED_RUNS_PER_FONT = 8000;
const shapedRuns = new WeakMap<object, Map<string, unknown>>();

/**
 * Remembers fontkit's shaping of each string per font. react-pdf's textkit
 * shapes every text run through `font.layout` and, in one memo, the same
 * strings over and over (units, table headings, labels, numbers; about two
 * thirds of the calls in a 25-page memo are repeats), and shaping (OpenType
 * feature lookups) is the largest single cost of a render. textkit only reads
 * the result: it copies the positions and slices the glyph arrays, so sharing
 * one result between runs is safe. Installed once on the font class.
 */
let shapingMemoised: Promise<void> | undefined;

export function memoiseGlyphShaping(): Promise<void> {
  // A failed install (a font file missing) is tried again by the next render rather than remembered.
  shapingMemoised ??= installShapingMemo().catch((err: unknown) => {
    shapingMemoised = undefined;
    throw err;
  });
  return shapingMemoised;
}

async function installShapingMemo(): Promise<void> {
  registerPdfFonts();
  const store = Font as unknown as {
    load(d: { fontFamily: string; fontWeight?: number }): Promise<void>;
    getFont(d: { fontFamily: string; fontWeight?: number }): { data?: ShapingFont } | null;
  };
  for (const fontFamily of [SANS, MONO, FALLBACK]) {
    await store.load({ fontFamily, fontWeight: 400 });
    const data = store.getFont({ fontFamily, fontWeight: 400 })?.data;
    if (data)
      memoiseLayoutOn(Object.getPrototypeOf(data) as ShapingFont & { [UNCACHED_LAYOUT]?: ShapingFont['layout'] });
  }
}

function memoiseLayoutOn(proto: ShapingFont & { [UNCACHED_LAYOUT]?: ShapingFont['layout'] }): void {
  if (proto[UNCACHED_LAYOUT]) return;
  const uncached = proto.layout;
  proto[UNCACHED_LAYOUT] = uncached;
  proto.layout = function layout(this: ShapingFont, text, features, script, language, direction) {
    let runs = shapedRuns.get(this);
    if (!runs) shapedRuns.set(this, (runs = new Map()));
    const key = `${JSON.stringify(features ?? null)}\u0000${script ?? ''}\u0000${language ?? ''}\u0000${direction ?? ''}\u0000${text}`;
    const known = runs.get(key);
    if (known !== undefined) return known;
    const shaped = uncached.call(this, text, features, script, language, direction);
    if (runs.size >= SHAPED_RUNS_PER_FONT) runs.clear();
    runs.set(key, shaped);
    return shaped;
  };
}

/** fontkit's own shaping, bypassing the memo (for tests). */
export function shapeUncached(font: ShapingFont, text: string): unknown {
  const proto = Object.getPrototypeOf(font) as { [UNCACHED_LAYOUT]?: ShapingFont['layout'] };
  return (proto[UNCACHED_LAYOUT] ?? font.layout).call(font, text);
}

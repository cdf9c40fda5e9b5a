/**
 * The shaping memo on react-pdf's fonts gives exactly what fontkit's own
 * `layout` gives (glyph ids and advances, checked against the uncached call
 * for plain text, numbers with units, the monospaced face and a symbol from
 * the fallback face), and answers a repeated string from memory.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { Font } from '@react-pdf/renderer';
import { FALLBACK, MONO, SANS, memoiseGlyphShaping, monoText, shapeUncached } from '@/lib/pdf/pdf-fonts';

interface Run {
  glyphs: { id: number }[];
  positions: { xAdvance: number; yAdvance: number; xOffset: number; yOffset: number }[];
}
interface Shaper {
  layout(text: string, features?: unknown): Run;
}

const fontOf = (fontFamily: string, fontWeight = 400): Shaper =>
  (Font as unknown as { getFont(d: object): { data: Shaper } }).getFont({ fontFamily, fontWeight }).data;

describe('memoiseGlyphShaping', () => {
  beforeAll(async () => {
    await memoiseGlyphShaping();
  });

  it.each([
    [SANS, 'The sun-synchronous inclination at 699.6 km is 98.19°.'],
    [SANS, 'ΔV ≈ 12.4 m/s per year; β = 23.5°'],
    [MONO, monoText('a = 7077.737 km, e = 0.001 15')],
    [FALLBACK, '⊕ ☉ ⌈x⌉'],
  ])('%s: "%s" shapes as fontkit shapes it', (family, text) => {
    const font = fontOf(family);
    const memo = font.layout(text);
    const own = shapeUncached(font, text) as Run;
    expect(memo.glyphs.map((g) => g.id)).toEqual(own.glyphs.map((g) => g.id));
    expect(memo.positions).toEqual(own.positions);
    expect(memo.glyphs.length).toBeGreaterThan(0);
  });

  it('answers a repeated string with the run it shaped before, and keeps feature sets apart', () => {
    const font = fontOf(SANS, 400);
    const first = font.layout('Local time of the ascending node');
    expect(font.layout('Local time of the ascending node')).toBe(first);
    expect(font.layout('Local time of the ascending node', ['liga'])).not.toBe(first);
  });

  it('is installed once: loading again does not wrap the wrapper', async () => {
    const font = fontOf(SANS);
    const layout = font.layout;
    await memoiseGlyphShaping();
    expect(fontOf(SANS).layout).toBe(layout);
  });
});

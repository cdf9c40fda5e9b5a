import { describe, expect, it } from 'vitest';
import { coastlinePoints } from '@/lib/figures/coastlines';

describe('coastlines (Natural Earth 1:110m land via world-atlas)', () => {
  it('no line steps across the antimeridian, so the plate carrée map draws no stray horizontal strokes', () => {
    const pts = coastlinePoints();
    let jumps = 0;
    for (let i = 1; i < pts.length; i++)
      if (pts[i].line === pts[i - 1].line && Math.abs(pts[i].lon - pts[i - 1].lon) > 180) jumps++;
    expect(jumps).toBe(0);
    // Fiji (about 17–18° S) and Chukotka (about 65–70° N) straddle ±180° and must still be drawn on both sides.
    const near = (lat0: number, lat1: number, side: number) =>
      pts.some((p) => p.lat > lat0 && p.lat < lat1 && Math.sign(p.lon) === side && Math.abs(p.lon) > 175);
    expect(near(-19, -15, 1) && near(-19, -15, -1)).toBe(true);
    expect(near(64, 72, 1) && near(64, 72, -1)).toBe(true);
  });
});

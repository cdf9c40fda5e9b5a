import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, rows } from './helpers';

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

describe('repeat-options', () => {
  it('the 695–710 km band with cycles ≤ 16 d includes Landsat WRS-2 233/16 (USGS Landsat 8 Data Users Handbook)', () => {
    const options = rows(
      outputsOf('repeat-options', { minAltitudeKm: 695, maxAltitudeKm: 710, maxDays: 16 }),
      'options',
    );
    const landsat = options.find((o) => o.revolutions === 233 && o.days === 16);
    expect(landsat).toBeDefined();
    expect(Math.abs((landsat?.altitudeKm ?? 0) + 6378.137 - 7077.7)).toBeLessThan(1);
  });

  it('lists every coprime pair in the band, sorted by altitude, matching repeat-orbit pair by pair', () => {
    const out = outputsOf('repeat-options', { minAltitudeKm: 600, maxAltitudeKm: 800, maxDays: 12 });
    const options = rows(out, 'options');
    expect(num(out, 'count')).toBe(options.length);
    for (let k = 1; k < options.length; k++)
      expect(options[k].altitudeKm).toBeGreaterThanOrEqual(options[k - 1].altitudeKm);
    // brute force: every coprime (R, D) with D ≤ 12 and R in 13..16 rev/day
    const expected: string[] = [];
    for (let d = 1; d <= 12; d++) {
      for (let r = 13 * d; r <= 16 * d; r++) {
        if (gcd(r, d) !== 1) continue;
        const alt = num(outputsOf('repeat-orbit', { revolutions: r, days: d }), 'altitudeKm');
        if (alt >= 600 && alt <= 800) expected.push(`${r}/${d}`);
      }
    }
    expect(options.map((o) => `${o.revolutions}/${o.days}`).sort()).toEqual(expected.sort());
  });

  it('with a fixed inclination the options are not sun-synchronous', () => {
    const options = rows(
      outputsOf('repeat-options', { minAltitudeKm: 1300, maxAltitudeKm: 1400, maxDays: 10, inclinationDeg: 66 }),
      'options',
    );
    expect(options.length).toBeGreaterThan(0);
    for (const o of options) expect(o.inclinationDeg).toBe(66);
  });

  it('rejects an empty or inverted band and too-long cycles', () => {
    expectFieldError('repeat-options', { minAltitudeKm: 800, maxAltitudeKm: 700, maxDays: 5 }, 'maxAltitudeKm');
    expectFieldError('repeat-options', { minAltitudeKm: 600, maxAltitudeKm: 700, maxDays: 61 }, 'maxDays');
  });
});

import { gstime, twoline2satrec } from 'satellite.js';
import { describe, expect, it } from 'vitest';
import { TERNLIGHT_LATEST_TLE, TERNLIGHT_TLES } from '@/lib/demo/ternlight-tles';
import { tleChecksum } from '@/lib/calc/topics/tle';
import { measureSgp4NodeRate } from '../support/sgp4';
import { expectFieldError, num, outputsOf, resultOf, rows } from './helpers';

/**
 * Vallado, Crawford, Hujsak & Kelso, "Revisiting Spacetrack Report #3", AIAA 2006-6753:
 * the verification set SGP4-VER.TLE and its output tcppver.out (TEME, km and km/s, printed
 * to 1e-8 km and 1e-9 km/s). Values at tsince = 0 as quoted, digit for digit, by several
 * independent public test suites.
 */
const VALLADO = {
  '00005': {
    tle: [
      '1 00005U 58002B   00179.78495062  .00000023  00000-0  28098-4 0  4753',
      '2 00005  34.2682 348.7242 1859667 331.7664  19.3264 10.82419157413667',
    ],
    r: [7022.46529266, -1400.08296755, 0.03995155],
    v: [1.893841015, 6.405893759, 4.53480725],
  },
  '06251': {
    tle: [
      '1 06251U 62025E   06176.82412014  .00008885  00000-0  12808-3 0  3985',
      '2 06251  58.0579  54.0425 0030035 139.1568 221.1854 15.56387291  6774',
    ],
    r: [3988.31022699, 5498.96657235, 0.90055879],
    v: [-3.290032738, 2.35765282, 6.496623475],
    /** SGP4's un-Kozai'd (Brouwer) mean motion printed in the debug output of the same run: xno = 0.067918037 rad/min */
    xnoRadPerMin: 0.067918037,
  },
};

function maxDiff(a: unknown, b: readonly number[]): number {
  if (!Array.isArray(a)) throw new Error('not a vector');
  return Math.max(...b.map((x, i) => Math.abs((a[i] as number) - x)));
}

describe('tle-check', () => {
  it('Vallado et al. 2006, satellites 00005 (SGP4, e = 0.186) and 06251 (with drag): TEME state at epoch within 1e-7 km and 1e-9 km/s of tcppver.out', () => {
    for (const c of [VALLADO['00005'], VALLADO['06251']]) {
      const out = outputsOf('tle-check', { tle: c.tle.join('\n') });
      expect(maxDiff(out.positionTemeKm, c.r)).toBeLessThan(1e-7);
      expect(maxDiff(out.velocityTemeKmS, c.v)).toBeLessThan(1e-9);
    }
  });

  it("mean semi-major axis is SGP4's Brouwer a: Vallado's printed xno for 06251 gives a = 6378.135 km × (k_e / xno)^(2/3) within 1e-4 km (the 9 printed digits)", () => {
    const xke = 60 / Math.sqrt(6378.135 ** 3 / 398600.8); // WGS-72, Spacetrack Report #3 units (earth radii, minutes)
    const a = 6378.135 * (xke / VALLADO['06251'].xnoRadPerMin) ** (2 / 3);
    const out = outputsOf('tle-check', { tle: VALLADO['06251'].tle.join('\n') });
    expect(Math.abs(num(out, 'meanSemiMajorAxisKm') - a)).toBeLessThan(1e-4);
    expect(num(out, 'meanAltitudeKm')).toBeCloseTo(num(out, 'meanSemiMajorAxisKm') - 6378.135, 9);
  });

  it("LTAN is the mean solar time at the node's longitude: UT + (Ω_TEME − GMST)/15 with satellite.js gstime (1e-6 h)", () => {
    const [name, l1, l2] = TERNLIGHT_LATEST_TLE.split('\n');
    expect(name).toBe('TERNLIGHT-1');
    const out = outputsOf('tle-check', { tle: TERNLIGHT_LATEST_TLE });
    const epoch = new Date(String(out.epoch));
    const satrec = twoline2satrec(l1, l2);
    const ut =
      epoch.getUTCHours() +
      epoch.getUTCMinutes() / 60 +
      (epoch.getUTCSeconds() + epoch.getUTCMilliseconds() / 1000) / 3600;
    const lonDeg = ((satrec.nodeo - gstime(epoch)) * 180) / Math.PI;
    const expected = (((ut + lonDeg / 15) % 24) + 24) % 24;
    expect(Math.abs(num(out, 'ltanHours') - expected)).toBeLessThan(1e-6);
  });

  it('the local-time drift matches the node rate fitted to 30 days of SGP4 positions (within 0.5 min/yr)', () => {
    const [, l1, l2] = TERNLIGHT_LATEST_TLE.split('\n');
    const out = outputsOf('tle-check', { tle: TERNLIGHT_LATEST_TLE });
    const rateDegPerDay = measureSgp4NodeRate([l1, l2], new Date(String(out.epoch)), 30);
    const driftMinPerYear = (rateDegPerDay - 360 / 365.24219) * 4 * 365.24219;
    expect(Math.abs(num(out, 'ltanDriftMinPerYear') - driftMinPerYear)).toBeLessThan(0.5);
  });

  it('compares with the design: differences signed flown − design, local time wrapped across midnight, altitude as the gap in semi-major axis', () => {
    const base = outputsOf('tle-check', { tle: TERNLIGHT_LATEST_TLE });
    const ltan = num(base, 'ltanHours');
    const out = outputsOf('tle-check', {
      tle: TERNLIGHT_LATEST_TLE,
      designLtanHours: (ltan + 23.9) % 24,
      designAltitudeKm: 692.84,
      designInclinationDeg: 98.2,
    });
    expect(num(out, 'ltanDifferenceMin')).toBeCloseTo(6, 6);
    // design a = 692.84 + 6378.137 (WGS-84); the TLE's a is SGP4's
    expect(num(out, 'altitudeDifferenceKm')).toBeCloseTo(num(base, 'meanSemiMajorAxisKm') - (692.84 + 6378.137), 9);
    expect(num(out, 'inclinationDifferenceDeg')).toBeCloseTo(0.0047, 9);
    expect(base.ltanDifferenceMin).toBeUndefined();
  });

  it('the demo TLEs of TERNLIGHT-1: eight sets, correct checksums, the as-flown history the scenario describes', () => {
    const lines = TERNLIGHT_TLES.split('\n').filter((l) => /^[12] /.test(l));
    expect(lines).toHaveLength(16);
    for (const l of lines) expect(Number(l[68])).toBe(tleChecksum(l));
    const r = resultOf('tle-check', {
      tle: TERNLIGHT_TLES,
      designLtanHours: 22.5,
      designAltitudeKm: 692.8374699,
      designInclinationDeg: 98.17671877,
    });
    const series = rows(r.outputs, 'series');
    expect(series).toHaveLength(8);
    expect(series[0].meanAltitudeKm).toBeCloseTo(692.8374699 - 4.21 + 0.002, 2); // injected 4.2 km low
    expect(Math.abs(num(r.outputs, 'altitudeDifferenceKm'))).toBeLessThan(0.3);
    expect(num(r.outputs, 'inclinationDifferenceDeg')).toBeCloseTo(0.028, 3);
    expect(num(r.outputs, 'ltanDifferenceMin')).toBeGreaterThan(1);
    expect(num(r.outputs, 'ltanDifferenceMin')).toBeLessThan(4);
    expect(r.outputs.satelliteNumber).toBe('T0001');
  });

  it('refuses bad TLEs with a 400-style field error on tle naming line, columns and checksum', () => {
    const bad = VALLADO['00005'].tle.join('\n').replace('4753', '4754');
    expect(expectFieldError('tle-check', { tle: bad }, 'tle')).toBe(
      'tle: text line 1 (line 1 of TLE set 1): checksum (column 69) is 4, expected 3 from columns 1–68: the line was altered or mistyped',
    );
    expect(expectFieldError('tle-check', {}, 'tle')).toMatch(/required/);
    expect(expectFieldError('tle-check', { tle: 'x'.repeat(20001) }, 'tle')).toMatch(/at most 20000/);
    // an eccentricity SGP4 cannot take
    const l2 = '2 00005  34.2682 348.7242 9999999 331.7664  19.3264 10.82419157413667'.slice(0, 68);
    expect(
      expectFieldError('tle-check', { tle: `${VALLADO['00005'].tle[0]}\n${l2}${tleChecksum(l2)}` }, 'tle'),
    ).toMatch(/SGP4 refuses/);
  });
});

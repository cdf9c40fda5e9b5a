import * as Astronomy from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { bruteForceShadow } from '../support/shadow';
import { expectFieldError, num, outputsOf, rows } from './helpers';

const R = 6378.137;
const observer = new Astronomy.Observer(0, 0, 0);
const DEG = Math.PI / 180;

/** Sun unit vector (equator of date) from astronomy-engine 2.1.19. */
function sunUnit(date: Date): [number, number, number] {
  const v = Astronomy.Equator(Astronomy.Body.Sun, date, observer, true, true).vec;
  const n = Math.hypot(v.x, v.y, v.z);
  return [v.x / n, v.y / n, v.z / n];
}

/** RAAN [rad] for a mean-Sun LTAN, using astronomy-engine sidereal time (GAST ≈ GMST within 1.2 s). */
function raanFromLtan(date: Date, ltanHours: number): number {
  const ut = date.getUTCHours() + date.getUTCMinutes() / 60;
  return (Astronomy.SiderealTime(date) * 15 - 15 * (ut - 12) + 15 * (ltanHours - 12)) * DEG;
}

describe('sun-geometry', () => {
  const inputs = {
    altitudeKm: 700,
    inclinationDeg: 98.19,
    ltanHours: 10.5,
    startEpoch: '2025-01-01T00:00:00Z',
    days: 365,
    stepDays: 5,
  };

  it('beta angle matches a computation with the astronomy-engine 2.1.19 Sun vector over 2025 (±0.02°)', () => {
    const out = outputsOf('sun-geometry', inputs);
    const nodeRate = num(outputsOf('node-rate', { altitudeKm: 700, inclinationDeg: 98.19 }), 'nodeRateDegPerDay') * DEG;
    const start = new Date(inputs.startEpoch);
    const raan0 = raanFromLtan(start, inputs.ltanHours);
    const series = rows(out, 'series');
    expect(series.length).toBe(74);
    series.forEach((row, k) => {
      const date = new Date(start.getTime() + k * 5 * 86400000);
      const raan = raan0 + nodeRate * k * 5;
      const i = inputs.inclinationDeg * DEG;
      const h = [Math.sin(i) * Math.sin(raan), -Math.sin(i) * Math.cos(raan), Math.cos(i)];
      const s = sunUnit(date);
      const beta = Math.asin(h[0] * s[0] + h[1] * s[1] + h[2] * s[2]) / DEG;
      expect(Math.abs(row.betaDeg - beta)).toBeLessThan(0.02);
    });
  });

  it('eclipse duration equals a brute-force cylindrical-shadow count around the orbit (±0.05 min)', () => {
    const out = outputsOf('sun-geometry', { ...inputs, days: 30, stepDays: 10, shadowModel: 'cylindrical' });
    const period = num(out, 'nodalPeriodMin');
    const start = new Date(inputs.startEpoch);
    const raan = raanFromLtan(start, inputs.ltanHours);
    const i = inputs.inclinationDeg * DEG;
    const s = sunUnit(start);
    const a = R + 700;
    let dark = 0;
    const n = 200000;
    for (let k = 0; k < n; k++) {
      const u = (2 * Math.PI * k) / n;
      const r = [
        a * (Math.cos(raan) * Math.cos(u) - Math.sin(raan) * Math.sin(u) * Math.cos(i)),
        a * (Math.sin(raan) * Math.cos(u) + Math.cos(raan) * Math.sin(u) * Math.cos(i)),
        a * Math.sin(u) * Math.sin(i),
      ];
      const along = r[0] * s[0] + r[1] * s[1] + r[2] * s[2];
      const perp = Math.sqrt(a * a - along * along);
      if (along < 0 && perp < R) dark++;
    }
    expect(Math.abs(rows(out, 'series')[0].eclipseMin - (dark / n) * period)).toBeLessThan(0.05);
  });

  it("conical model (default): umbra and umbra + penumbra per row match the brute-force apparent-disc test at that day's β and Sun distance (astronomy-engine 2.1.19 Sun; ±0.01 min)", () => {
    const out = outputsOf('sun-geometry', { ...inputs, ltanHours: 13.5, days: 180, stepDays: 30 });
    const period = num(out, 'nodalPeriodMin');
    const start = new Date(inputs.startEpoch);
    rows(out, 'series').forEach((row, k) => {
      const date = new Date(start.getTime() + k * 30 * 86400000);
      const dist = Astronomy.GeoVector(Astronomy.Body.Sun, date, true).Length() * 149597870.7;
      const ref = bruteForceShadow(700, row.betaDeg, dist, 100000, period);
      expect(Math.abs(row.umbraMin - ref.umbra)).toBeLessThan(0.01);
      expect(Math.abs(row.penumbraMin - ref.penumbra)).toBeLessThan(0.01);
      expect(row.eclipseMin).toBe(row.umbraMin);
      expect(row.umbraMin).toBeGreaterThan(20);
    });
    expect(num(out, 'penumbraMaxMin')).toBeGreaterThan(num(out, 'eclipseMaxMin'));
  });

  it('noon/midnight node (β ≈ 0) gives the longest eclipse P·asin(R/a)/π ≈ 35.3 min at 700 km (cylindrical shadow)', () => {
    const out = outputsOf('sun-geometry', { ...inputs, ltanHours: 12, stepDays: 1, shadowModel: 'cylindrical' });
    const period = num(out, 'nodalPeriodMin');
    expect(Math.abs(num(out, 'betaMinDeg'))).toBeLessThan(6);
    expect(num(out, 'eclipseMaxMin')).toBeCloseTo((period * Math.asin(R / (R + 700))) / Math.PI, 1);
    expect(num(out, 'eclipseFreeDays')).toBe(0);
  });

  it('dawn-dusk (18:00 LTAN) SSO at 700 km is eclipse-free most of the year with short eclipses (common practice, no source)', () => {
    const out = outputsOf('sun-geometry', { ...inputs, ltanHours: 18, stepDays: 1 });
    expect(num(out, 'eclipseFreeDays')).toBeGreaterThan(250);
    expect(num(out, 'eclipseMaxMin')).toBeLessThan(25);
    expect(num(out, 'betaMaxDeg')).toBeGreaterThan(80);
    expect(num(out, 'criticalBetaDeg')).toBeCloseTo(Math.asin(R / (R + 700)) / DEG, 6);
  });

  it('rejects spans that would need too many samples and zero spans', () => {
    expectFieldError('sun-geometry', { ...inputs, days: 3000, stepDays: 0.01 }, 'stepDays');
    expectFieldError('sun-geometry', { ...inputs, days: 0 }, 'days');
    expectFieldError('sun-geometry', { ...inputs, startEpoch: '2025-13-01' }, 'startEpoch');
  });
});

/**
 * Contact geometry against the closed form of Wertz & Larson, Space Mission Analysis
 * and Design, 3rd ed. (1999), ch. 5 (from memory): for a circular orbit of period P
 * at altitude H and a minimum elevation ε, sin ρ = R/(R + H), sin η = sin ρ cos ε,
 * the Earth central angle λ_max = 90° − ε − η and the longest (overhead) pass lasts
 * T = P λ_max / 180°. The closed form neglects the Earth's rotation, so the check is
 * made with the rotation set to 0 (within 1 %); with the rotation on, an overhead
 * pass at the equator of a 98° orbit is shorter by about the ratio of ground speeds
 * (≈ 1.2 %), checked within 2 %. The station sits on the sub-satellite point one
 * revolution after the start, so the pass is complete and exactly overhead.
 */
import { describe, expect, it } from 'vitest';
import { computeSitePasses, contactOrbitNodalPeriod, type ContactOrbit } from '@/lib/calc/topics/station-contacts';
import { computeEarthFixedPosition } from '@/lib/calc/topics/ground-track';
import { computeSecularRates } from '@/lib/calc/topics/secular-rates';
import { gmstRad, julianDate } from '@/lib/calc/topics/time';
import { parseSiteList } from '@/lib/calc/topics/site-list';
import { runCalc } from '@/lib/calc';
import { CalcInputError } from '@/lib/calc/types';
import { EARTH_RADIUS_KM, EARTH_ROTATION_RAD_S } from '@/lib/calc/constants';

const H = 700;
const deg = Math.PI / 180;

function smadMaxPassS(periodS: number, minElevationDeg: number): number {
  const sinRho = EARTH_RADIUS_KM / (EARTH_RADIUS_KM + H);
  const eta = Math.asin(sinRho * Math.cos(minElevationDeg * deg)) / deg;
  const lambda = 90 - minElevationDeg - eta;
  return (periodS * lambda) / 180;
}

function overheadPass(earthRotationRadS: number, minElevationDeg: number) {
  const jd0 = julianDate(new Date('2027-09-15T00:00:00Z'));
  const orbit: ContactOrbit = {
    aKm: EARTH_RADIUS_KM + H,
    iRad: 98.19 * deg,
    raan0: 1.2,
    jd0,
    theory: 'zonal',
    earthRotationRadS,
  };
  const period = contactOrbitNodalPeriod(orbit);
  const rates = computeSecularRates(orbit.aKm, 0, orbit.iRad, 'zonal');
  const [x, y] = computeEarthFixedPosition(
    orbit.aKm,
    orbit.iRad,
    orbit.raan0,
    gmstRad(jd0),
    earthRotationRadS,
    rates.perigeeRate + rates.meanAnomalyRate,
    rates.nodeRate,
    period,
  );
  const site = { name: 'Equator', latDeg: 0, lonDeg: Math.atan2(y, x) / deg, altitudeKm: 0, minElevationDeg, line: 2 };
  const passes = computeSitePasses(orbit, [site], 2 * period, 20)[0];
  const pass = passes.find((p) => p.startS < period && p.endS > period)!;
  return { pass, period };
}

describe('overhead pass against SMAD (3rd ed., ch. 5)', () => {
  it.each([0, 5, 10, 20])(
    'minimum elevation %i°, no Earth rotation: duration within 1 % of P λ_max / 180°, peak 90°',
    (minEl) => {
      const { pass, period } = overheadPass(0, minEl);
      const expected = smadMaxPassS(period, minEl);
      expect(Math.abs(pass.endS - pass.startS - expected) / expected).toBeLessThan(0.01);
      expect(pass.maxElevationDeg).toBeGreaterThan(89.9);
      expect(pass.clipped).toBe(false);
    },
  );

  it('with the Earth rotating, 10°: within 2 % and shorter (the ground moves against a 98° track)', () => {
    const { pass, period } = overheadPass(EARTH_ROTATION_RAD_S, 10);
    const expected = smadMaxPassS(period, 10);
    const d = pass.endS - pass.startS;
    expect(Math.abs(d - expected) / expected).toBeLessThan(0.02);
    expect(d).toBeLessThan(expected);
  });
});

describe('site list CSV', () => {
  const csv =
    'name, latitude, longitude, altitude (m), minimum elevation\nNorthmere Basin,52.1,-3.2,120,5\n"Kestrel Ridge, north",64.5,18.0,410,10\n';
  it('reads names (quoted with a comma), degrees, metres and the elevation mask', () => {
    expect(parseSiteList(csv)).toEqual([
      { name: 'Northmere Basin', latDeg: 52.1, lonDeg: -3.2, altitudeKm: 0.12, minElevationDeg: 5, line: 2 },
      { name: 'Kestrel Ridge, north', latDeg: 64.5, lonDeg: 18, altitudeKm: 0.41, minElevationDeg: 10, line: 3 },
    ]);
  });
  it.each([
    ['name,latitude,longitude,altitude\nA,1,2,3', /line 1: the header has no minimum elevation column/],
    ['name,lat,lon,alt,min elevation\nA,95,2,3,5', /line 2, latitude: 95 deg is outside -90 … 90 deg/],
    ['name,lat,lon,alt,min elevation\nA,45,x,3,5', /line 2, longitude: "x" is not a number/],
    ['name,lat,lon,alt,min elevation\nA,45,2,3', /line 2: 4 fields where the header has 5/],
    ['name,lat,lon,alt,min elevation\nA,45,2,3,5\nA,46,2,3,5', /line 3, name: "A" is already the site of line 2/],
    ['name,lat,lon,alt,colour\nA,45,2,3,5', /line 1: column "colour" is not one of/],
  ])('refuses %j', (text, message) => {
    expect(() => parseSiteList(text)).toThrow(CalcInputError);
    expect(() => parseSiteList(text)).toThrow(message);
  });
});

describe('station-contacts and site-revisit kinds', () => {
  const sites =
    'name,latitude,longitude,altitude (m),minimum elevation\nNorthmere Basin,52.1,-3.2,120,5\nKestrel Ridge,64.5,18.0,410,10\n';
  it('a high-latitude station sees more passes per day than a mid-latitude one (polar orbit), every number finite', () => {
    const r = runCalc('station-contacts', { sites, altitudeKm: 700, inclinationDeg: 98.19, days: 2 });
    if (!r.ok) throw new Error(r.error);
    const rows = r.result.outputs.stations as {
      site: string;
      passesPerDay: number;
      dailyContactMin: number;
      maxPassMin: number;
    }[];
    expect(rows[1].passesPerDay).toBeGreaterThan(rows[0].passesPerDay);
    const smad5 = smadMaxPassS((r.result.outputs.nodalPeriodMin as number) * 60, 5) / 60;
    expect(rows[0].maxPassMin).toBeLessThanOrEqual(smad5 * 1.001);
    expect(r.result.outputs.dailyContactMin as number).toBeGreaterThan(
      Math.max(...rows.map((x) => x.dailyContactMin)) - 1e-9,
    );
  });
  it('a malformed site list is refused naming the line and column', () => {
    const r = runCalc('station-contacts', { sites: sites.replace('52.1', '95') });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.fields.sites).toMatch(/line 2, latitude/);
  });
  it('site-revisit: a wider off-nadir limit gives more accesses and a shorter mean revisit; a 0 km-altitude geometry check of the limit', () => {
    const narrow = runCalc('site-revisit', { sites, altitudeKm: 700, days: 5, offNadirDeg: 15 });
    const wide = runCalc('site-revisit', { sites, altitudeKm: 700, days: 5, offNadirDeg: 45 });
    if (!narrow.ok || !wide.ok) throw new Error('failed');
    const n = narrow.result.outputs.sites as { accessesPerDay: number; meanRevisitHours: number }[];
    const w = wide.result.outputs.sites as { accessesPerDay: number; meanRevisitHours: number }[];
    expect(w[0].accessesPerDay).toBeGreaterThan(n[0].accessesPerDay);
    expect(w[0].meanRevisitHours).toBeLessThan(n[0].meanRevisitHours);
    // Off-nadir 0° means the zenith: elevation 90°.
    const zen = runCalc('site-revisit', { sites, altitudeKm: 700, days: 1, offNadirDeg: 0 });
    if (!zen.ok) throw new Error(zen.error);
    expect(zen.result.outputs.minElevationDeg as number).toBeCloseTo(90, 9);
  });
});

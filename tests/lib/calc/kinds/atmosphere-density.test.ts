/**
 * atmosphere-density: the kind wraps NRLMSISE-00 (its own published test-driver check is in
 * tests/lib/calc/topics/atmosphere/nrlmsise00.test.ts). Checks here: the epoch → day-of-year / UT /
 * local-solar-time conversion, units (g/cm³ → kg/m³), physical ordering, the model note and input refusal.
 */
import { describe, expect, it } from 'vitest';
import { computeDayOfYear } from '@/lib/calc/topics/atmosphere/density-at-epoch';
import { evaluateNrlmsise00 } from '@/lib/calc/topics/atmosphere/nrlmsise00';
import { expectFieldError, num, outputsOf, resultOf } from './helpers';

describe('atmosphere-density', () => {
  it('passes day of year, UT and LST = UT + longitude/15 to the model (wiring check: 2026-06-21 08:03:20 UTC is the test driver day 172, UT 29000 s; at 70° W the LST is 8.0556 − 4.6667 = 3.3889 h) and converts g/cm³ to kg/m³', () => {
    const out = outputsOf('atmosphere-density', {
      epoch: '2026-06-21T08:03:20Z',
      altitudeKm: 400,
      latitudeDeg: 60,
      longitudeDeg: -70,
      f107: 150,
      f107Average: 150,
      ap: 4,
    });
    expect(num(out, 'localSolarTimeHours')).toBeCloseTo(3.388889, 6);
    const model = evaluateNrlmsise00({
      dayOfYear: 172,
      utSeconds: 29000,
      altitudeKm: 400,
      latitudeDeg: 60,
      longitudeDeg: -70,
      localSolarTimeHours: 3.3888888888888893,
      f107Average: 150,
      f107: 150,
      ap: 4,
    });
    expect(num(out, 'densityKgM3') / (model.effectiveMassDensityGCm3 * 1000)).toBeCloseTo(1, 12);
    expect(num(out, 'exosphericTemperatureK')).toBeCloseTo(model.exosphericTemperatureK, 9);
    expect(num(out, 'temperatureK')).toBeCloseTo(model.temperatureK, 9);
  });

  it('day of year and seconds of the UTC day (leap year end, new year)', () => {
    expect(computeDayOfYear(new Date('2026-06-21T08:03:20Z'))).toEqual({ dayOfYear: 172, utSeconds: 29000 });
    expect(computeDayOfYear(new Date('2024-12-31T23:59:59Z'))).toEqual({ dayOfYear: 366, utSeconds: 86399 });
    expect(computeDayOfYear(new Date('2025-01-01T00:00:00Z'))).toEqual({ dayOfYear: 1, utSeconds: 0 });
  });

  it('local solar time wraps into 0–24 h (UT 23 h at 30° E is 1 h)', () => {
    expect(
      num(outputsOf('atmosphere-density', { epoch: '2025-03-20T23:00:00Z', longitudeDeg: 30 }), 'localSolarTimeHours'),
    ).toBeCloseTo(1, 9);
  });

  it('names the model and its published sources in the model note, with the caution', () => {
    const r = resultOf('atmosphere-density', {});
    expect(r.model.references.join(' ')).toMatch(/Picone.*J\. Geophys\. Res\. 107\(A12\)/);
    expect(r.model.assumptions.join(' ')).toMatch(/Preliminary-design model/);
    expect(JSON.stringify(r.model)).not.toMatch(/from memory/i);
  });

  it('density falls with altitude and rises with solar flux (physical ordering)', () => {
    const rho = (i: Record<string, unknown>) => num(outputsOf('atmosphere-density', i), 'densityKgM3');
    expect(rho({ altitudeKm: 300 })).toBeGreaterThan(rho({ altitudeKm: 500 }));
    expect(rho({ altitudeKm: 500, f107: 250, f107Average: 250 })).toBeGreaterThan(
      5 * rho({ altitudeKm: 500, f107: 70, f107Average: 70 }),
    );
  });

  it.each([
    [{ altitudeKm: -1 }, 'altitudeKm', /at least 0 km/],
    [{ altitudeKm: 1200 }, 'altitudeKm', /at most 1000 km/],
    [{ latitudeDeg: 91 }, 'latitudeDeg', /at most 90 deg/],
    [{ f107: 20 }, 'f107', /at least 50/],
    [{ ap: -3 }, 'ap', /at least 0/],
    [{ epoch: '2025-13-01' }, 'epoch', /ISO 8601/],
    [{ f107Average: 'high' }, 'f107Average', /^f107Average: must be a number from 50 to 400 \(got text "high"\)/],
  ])('refuses %j naming %s', (inputs, field, message) => {
    expect(expectFieldError('atmosphere-density', inputs, field)).toMatch(message);
  });

  it('warns for storm-level Ap and flux outside 60–300 sfu', () => {
    expect(resultOf('atmosphere-density', { ap: 200 }).warnings.join(' ')).toMatch(/storm/);
    expect(resultOf('atmosphere-density', { f107: 350 }).warnings.join(' ')).toMatch(/extrapolating/);
  });
});

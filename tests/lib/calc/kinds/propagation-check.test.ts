import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, resultOf, rows } from './helpers';

describe('propagation-check', () => {
  it('theory "j2", J2 force: DOP853 RAAN drift over 30 days agrees with the first-order secular rate within 1 % (Kozai 1959)', () => {
    const out = outputsOf('propagation-check', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      days: 30,
      integrator: 'dop853',
      relTol: 1e-10,
      theory: 'j2',
      zonalDegree: 2,
    });
    expect(Math.abs(num(out, 'raanDriftDifferencePercent'))).toBeLessThan(1);
    // sun-synchronous: ≈ 0.9856 °/day × 30 d
    expect(num(out, 'raanDriftNumericDeg')).toBeGreaterThan(29.4);
    expect(num(out, 'raanDriftNumericDeg')).toBeLessThan(29.9);
    expect(Math.abs(num(out, 'smaDriftKm'))).toBeLessThan(0.05);
    expect(num(out, 'energyRelError')).toBeLessThan(1e-8);
  });

  it('RK4, DOPRI5 and DOP853 give the same mean drift (±1e-4 relative) for a 51.6° orbit over 5 days', () => {
    const drift = (integrator: string) =>
      num(
        outputsOf('propagation-check', { altitudeKm: 420, inclinationDeg: 51.6, days: 5, integrator, relTol: 1e-10 }),
        'raanDriftNumericDeg',
      );
    const ref = drift('dop853');
    expect(ref).toBeLessThan(-20); // ≈ −5 °/day
    expect(Math.abs(drift('dopri5') / ref - 1)).toBeLessThan(1e-4);
    expect(Math.abs(drift('rk4') / ref - 1)).toBeLessThan(1e-4);
  });

  it('energy error shrinks with tolerance and element history is sampled (≤ 400 rows)', () => {
    const loose = outputsOf('propagation-check', { days: 5, relTol: 1e-6 });
    const tight = outputsOf('propagation-check', { days: 5, relTol: 1e-12 });
    expect(num(tight, 'energyRelError')).toBeLessThan(num(loose, 'energyRelError') / 100);
    expect(num(tight, 'energyRelError')).toBeLessThan(1e-11);
    expect(num(tight, 'steps')).toBeGreaterThan(num(loose, 'steps'));
    const h = rows(tight, 'history');
    expect(h.length).toBeGreaterThan(300);
    expect(h.length).toBeLessThanOrEqual(400);
    expect(h[h.length - 1].tDays).toBeGreaterThan(4.9);
  });

  it.each([
    [700, 98.19],
    [500, 97.4],
    [800, 60],
  ])(
    "starts from mean elements at %d km, %d°: the osculating start a sits above the mean a by Kozai's short-period term (±0.05 km)",
    (altitudeKm, inclinationDeg) => {
      // Kozai (1959) first-order short-period term for e = 0 at the node (u = 0), written from memory:
      // a_osc − a_mean = (3/2) J2 Re²/a · sin²i · cos 2u; J2 = 1.08262668e-3, Re = 6378.137 km.
      const out = outputsOf('propagation-check', {
        altitudeKm,
        inclinationDeg,
        days: 2,
        integrator: 'dop853',
        relTol: 1e-10,
      });
      const h = rows(out, 'history');
      const a = 6378.137 + altitudeKm;
      const i = (inclinationDeg * Math.PI) / 180;
      const deltaAKm = 1.5 * 1.08262668e-3 * (6378.137 ** 2 / a) * Math.sin(i) ** 2;
      expect(new Set(h.map((r) => r.smaAnalyticKm)).size).toBe(1);
      expect(h[0].smaAnalyticKm).toBeCloseTo(a, 9);
      expect(h[0].inclinationAnalyticDeg).toBeCloseTo(inclinationDeg, 9);
      expect(Math.abs(num(out, 'startOsculatingSmaKm') - a - deltaAKm)).toBeLessThan(0.05);
      expect(h[0].smaKm).toBeCloseTo(num(out, 'startOsculatingSmaKm'), 6);
    },
  );

  it('at the zonal SSO inclination (700 km), the J2–J6 node drift over 365 days is 360° × 365/365.24219 within 0.05 % (issue requirement; tropical year of the Explanatory Supplement)', () => {
    const inc = num(outputsOf('sso-inclination', { altitudeKm: 700 }), 'inclinationDeg');
    const r = resultOf('propagation-check', {
      altitudeKm: 700,
      inclinationDeg: inc,
      days: 365,
      integrator: 'dop853',
      relTol: 1e-10,
      zonalDegree: 6,
    });
    const expected = (360 * 365) / 365.24219;
    const drift = num(r.outputs, 'raanDriftNumericDeg');
    expect(Math.abs(drift / expected - 1)).toBeLessThan(5e-4);
    // the analytic rate of the same (zonal, degree 6) theory agrees with the numerical one to better than 0.01 %
    expect(Math.abs(num(r.outputs, 'raanDriftDifferencePercent'))).toBeLessThan(0.01);
    expect(r.outputs.theory).toBe('zonal');
    expect(r.warnings).toEqual([]);
  });

  it('compares with the analytic rate of the same field: J2-only force vs zonal theory limited to J2 (Brouwer J2²) within 0.005 %, first-order theory off by more', () => {
    const base = {
      altitudeKm: 700,
      inclinationDeg: 98.2,
      days: 20,
      integrator: 'dop853',
      relTol: 1e-10,
      zonalDegree: 2,
    };
    const zonal = num(outputsOf('propagation-check', base), 'raanDriftDifferencePercent');
    const j2 = num(outputsOf('propagation-check', { ...base, theory: 'j2' }), 'raanDriftDifferencePercent');
    expect(Math.abs(zonal)).toBeLessThan(0.005);
    expect(Math.abs(j2)).toBeGreaterThan(0.02);
  });

  it('warns when the energy error exceeds 1e-7 and when the tolerance is too loose for the span (dopri5, relTol 1e-6, 30 days)', () => {
    const r = resultOf('propagation-check', {
      altitudeKm: 700,
      inclinationDeg: 98.2,
      days: 30,
      integrator: 'dopri5',
      relTol: 1e-6,
    });
    expect(num(r.outputs, 'energyRelError')).toBeGreaterThan(1e-7);
    expect(r.warnings.join(' ')).toMatch(/energy error/);
    expect(r.warnings.join(' ')).toMatch(/too loose/);
  });

  it('refuses spans over 400 days and tolerances outside [1e-13, 1e-3]', () => {
    expectFieldError('propagation-check', { days: 401 }, 'days');
    expectFieldError('propagation-check', { relTol: 1e-14 }, 'relTol');
    expectFieldError('propagation-check', { relTol: 1e-2 }, 'relTol');
    expectFieldError('propagation-check', { integrator: 'euler' }, 'integrator');
    expectFieldError('propagation-check', { zonalDegree: 7 }, 'zonalDegree');
    expectFieldError('propagation-check', { zonalDegree: 1 }, 'zonalDegree');
  });
});

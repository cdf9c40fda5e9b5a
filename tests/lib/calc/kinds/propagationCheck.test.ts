import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, rows } from './helpers';

describe('propagation-check', () => {
  it('DOP853 J2 RAAN drift over 30 days agrees with the secular rate within 1 % (Kozai 1959 first-order theory)', () => {
    const out = outputsOf('propagation-check', { altitudeKm: 700, inclinationDeg: 98.19, days: 30, integrator: 'dop853', relTol: 1e-10 });
    expect(Math.abs(num(out, 'raanDriftDifferencePercent'))).toBeLessThan(1);
    // sun-synchronous: ≈ 0.9856 °/day × 30 d
    expect(num(out, 'raanDriftNumericDeg')).toBeGreaterThan(29.4);
    expect(num(out, 'raanDriftNumericDeg')).toBeLessThan(29.9);
    expect(Math.abs(num(out, 'smaDriftKm'))).toBeLessThan(0.05);
    expect(num(out, 'energyRelError')).toBeLessThan(1e-8);
  });

  it('RK4, DOPRI5 and DOP853 give the same mean drift (±1e-4 relative) for a 51.6° orbit over 5 days', () => {
    const drift = (integrator: string) => num(outputsOf('propagation-check', { altitudeKm: 420, inclinationDeg: 51.6, days: 5, integrator, relTol: 1e-10 }), 'raanDriftNumericDeg');
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
  ])('analytic a and i at %d km, %d°: constant mean values that sit below the circular start by the short-period J2 terms of Kozai (1959)', (altitudeKm, inclinationDeg) => {
    // The start is on the ascending node (argument of latitude u = 0) with the two-body circular speed, so its
    // osculating a and i equal the inputs. Kozai's first-order short-period terms for e = 0, written from memory:
    // a_osc − a_mean = (3/2) J2 Re²/a · sin²i · cos 2u and i_osc − i_mean = (3/8) J2 (Re/a)² · sin 2i · cos 2u.
    // J2 = 1.08262668e-3 and Re = 6378.137 km (EGM2008 values).
    const out = outputsOf('propagation-check', { altitudeKm, inclinationDeg, days: 5, integrator: 'dop853', relTol: 1e-10 });
    const h = rows(out, 'history');
    const a = 6378.137 + altitudeKm;
    const i = (inclinationDeg * Math.PI) / 180;
    const j2 = 1.08262668e-3;
    const deltaAKm = 1.5 * j2 * (6378.137 ** 2 / a) * Math.sin(i) ** 2;
    const deltaIDeg = (0.375 * j2 * (6378.137 / a) ** 2 * Math.sin(2 * i) * 180) / Math.PI;
    expect(new Set(h.map((r) => r.smaAnalyticKm)).size).toBe(1);
    expect(new Set(h.map((r) => r.inclinationAnalyticDeg)).size).toBe(1);
    expect(a - (h[0].smaAnalyticKm as number)).toBeCloseTo(deltaAKm, 1); // ±0.05 km of ≈ 7–9.5 km
    expect(Math.abs(inclinationDeg - (h[0].inclinationAnalyticDeg as number) - deltaIDeg)).toBeLessThan(5e-5);
    expect(h[0].smaKm).toBeCloseTo(a, 6);
  });

  it('refuses spans over 400 days and tolerances outside [1e-13, 1e-3]', () => {
    expectFieldError('propagation-check', { days: 401 }, 'days');
    expectFieldError('propagation-check', { relTol: 1e-14 }, 'relTol');
    expectFieldError('propagation-check', { relTol: 1e-2 }, 'relTol');
    expectFieldError('propagation-check', { integrator: 'euler' }, 'integrator');
  });
});

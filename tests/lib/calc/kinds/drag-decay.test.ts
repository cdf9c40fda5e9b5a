import { describe, expect, it } from 'vitest';
import { integrateAdaptive } from '../../../../lib/calc/topics/propagation/integrators';
import { expectFieldError, num, outputsOf, resultOf } from './helpers';

// Today's static path (Vallado Table 8-4 / MSISE-90 tables) must stay exactly as before: every check here runs it.
const sat = { massKg: 100, areaM2: 1, dragCoefficient: 2.2, atmosphere: 'exponential' }; // B = m/(C_D A) ≈ 45 kg/m²

describe('drag-decay', () => {
  it.each([
    [400, 3.725e-12],
    [450, 1.585e-12],
    [700, 3.614e-14],
    [1000, 3.019e-15],
  ])('Vallado 4th ed. Table 8-4 density at %d km = %s kg/m³ (moderate)', (h, rho) => {
    expect(num(outputsOf('drag-decay', { ...sat, altitudeKm: h }), 'densityKgM3')).toBeCloseTo(rho, 20);
  });

  it('Vallado Table 8-4 between rows: ρ(420 km) = 3.725e-12 · exp(−20/58.515)', () => {
    const rho = num(outputsOf('drag-decay', { ...sat, altitudeKm: 420 }), 'densityKgM3');
    expect(rho / (3.725e-12 * Math.exp(-20 / 58.515))).toBeCloseTo(1, 12);
  });

  it.each([
    ['low', 400, 5.68e-13],
    ['high', 400, 5.04e-11],
    ['low', 600, 1.03e-14],
    ['high', 800, 9.59e-13],
  ] as const)('MSISE-90 %s-activity density at %d km = %s kg/m³ (Braeunig table)', (solarActivity, h, rho) => {
    expect(num(outputsOf('drag-decay', { ...sat, altitudeKm: h, solarActivity }), 'densityKgM3')).toBeCloseTo(rho, 20);
  });

  it('decay rate and drag ΔV per year agree with a numerical integration of the drag equations of motion at 400 km (within 0.05 %)', () => {
    // Independent method: Cowell integration (DOP853, Hairer, Nørsett & Wanner 2nd ed. §II.5) of two-body motion
    // plus drag a = −½ ρ (C_D A/m) |v| v at the tabulated 400 km density (Vallado 4th ed. Table 8-4), one day from
    // a circular start; a from the orbital energy, ΔV as ∫|a_drag| dt. Tolerance 0.05 % (toBeCloseTo(1, 3)):
    // both hold the density at its 400 km value; the ≈ 0.4 km the orbit sinks in the day moves √(μ a) by ≈ 3e-5 relative.
    const out = outputsOf('drag-decay', { ...sat, altitudeKm: 400 });
    const mu = 398600.4418;
    const rhoB = (3.725e-12 * (2.2 * 1)) / 100; // kg/m³ · m²/kg = 1/m
    const a0 = 6778.137;
    const v0 = Math.sqrt(mu / a0);
    const y0 = Float64Array.from([a0, 0, 0, v0, 0]); // x, y [km], vx, vy [km/s], ∫|a_drag| dt [km/s]
    integrateAdaptive(
      'dop853',
      (_t, y, d) => {
        const r3 = Math.hypot(y[0], y[1]) ** 3;
        const v = Math.hypot(y[2], y[3]);
        const k = 0.5 * rhoB * 1000 * v; // ½ ρ B v² in km/s² per km/s of velocity (v in km/s, ρB per metre)
        d[0] = y[2];
        d[1] = y[3];
        d[2] = (-mu * y[0]) / r3 - k * y[2];
        d[3] = (-mu * y[1]) / r3 - k * y[3];
        d[4] = k * v;
      },
      0,
      y0,
      86400,
      { relTol: 1e-12, absTol: 1e-12, maxSteps: 1e6 },
      (_t, y) => y0.set(y),
    );
    const a1 = -mu / (2 * (0.5 * (y0[2] ** 2 + y0[3] ** 2) - mu / Math.hypot(y0[0], y0[1])));
    expect(num(out, 'decayKmPerDay') / (a0 - a1)).toBeCloseTo(1, 3);
    expect(num(out, 'maintenanceDeltaVMpsPerYear') / (y0[4] * 1000 * 365.24219)).toBeCloseTo(1, 3);
  });

  it('lifetime equals an independent fine Simpson integration of the same decay rate (400 → 200 km, moderate)', () => {
    const out = outputsOf('drag-decay', { ...sat, altitudeKm: 400 });
    const rows = [
      [200, 2.789e-10, 37.105],
      [250, 7.248e-11, 45.546],
      [300, 2.418e-11, 53.628],
      [350, 9.518e-12, 53.298],
    ];
    const rho = (h: number) => {
      const r = [...rows].reverse().find((x) => h >= x[0]) ?? rows[0];
      return r[1] * Math.exp(-(h - r[0]) / r[2]);
    };
    const g = (h: number) => 1 / (rho(h) * (2.2 / 100) * 1000 * Math.sqrt(398600.4418 * (6378.137 + h)));
    const n = 20000;
    const dh = 200 / n;
    let s = g(200) + g(400);
    for (let k = 1; k < n; k++) s += (k % 2 ? 4 : 2) * g(200 + k * dh);
    expect(num(out, 'lifetimeDays') / ((s * dh) / 3 / 86400)).toBeCloseTo(1, 4);
  });

  it('lifetimes are of the usual order for B ≈ 45 kg/m²: under a few years at 400 km, decades at 600 km, centuries at 800 km (order-of-magnitude statements, common practice, no single source)', () => {
    const years = (altitudeKm: number) => num(outputsOf('drag-decay', { ...sat, altitudeKm }), 'lifetimeYears');
    expect(years(400)).toBeGreaterThan(0.1);
    expect(years(400)).toBeLessThan(3);
    expect(years(600)).toBeGreaterThan(3);
    expect(years(600)).toBeLessThan(50);
    expect(years(800)).toBeGreaterThan(50);
    expect(years(800)).toBeLessThan(1000);
  });

  it('higher solar activity shortens the lifetime; below 200 km the lifetime is 0 with a warning', () => {
    const life = (solarActivity: string) =>
      num(outputsOf('drag-decay', { ...sat, altitudeKm: 500, solarActivity }), 'lifetimeDays');
    expect(life('low')).toBeGreaterThan(life('moderate'));
    expect(life('moderate')).toBeGreaterThan(life('high'));
    const r = resultOf('drag-decay', { ...sat, altitudeKm: 180 });
    expect(num(r.outputs, 'lifetimeDays')).toBe(0);
    expect(r.warnings.join(' ')).toMatch(/200 km/);
  });

  it('rejects altitudes beyond the chosen table and non-physical mass/area', () => {
    expectFieldError('drag-decay', { ...sat, altitudeKm: 950, solarActivity: 'low' }, 'altitudeKm');
    expectFieldError('drag-decay', { ...sat, massKg: 0, altitudeKm: 400 }, 'massKg');
    expectFieldError('drag-decay', { ...sat, areaM2: -1, altitudeKm: 400 }, 'areaM2');
    expectFieldError('drag-decay', { ...sat, altitudeKm: 400, solarActivity: 'extreme' }, 'solarActivity');
  });
});

describe('drag-decay over dates (NRLMSISE-00)', () => {
  const base = { massKg: 100, areaM2: 1, dragCoefficient: 2.2, startEpoch: '2026-01-01T00:00:00Z' };

  it('re-entry date = start + lifetime; the series starts at the altitude, falls monotonically and ends at 120 km on the re-entry date', () => {
    const out = outputsOf('drag-decay', { ...base, altitudeKm: 450 });
    const series = out.series as { date: string; days: number; altitudeKm: number; f107Average: number }[];
    expect(series[0].altitudeKm).toBeCloseTo(450, 9);
    for (let k = 1; k < series.length; k++) expect(series[k].altitudeKm).toBeLessThan(series[k - 1].altitudeKm);
    const last = series[series.length - 1];
    expect(last.altitudeKm).toBeCloseTo(120, 6);
    expect(last.days).toBeCloseTo(num(out, 'lifetimeDays'), 6);
    expect(Date.parse(out.reentryEpoch as string)).toBeCloseTo(
      Date.parse(base.startEpoch) + num(out, 'lifetimeDays') * 86_400_000,
      -3,
    );
    expect(out.reentersWithinHorizon).toBe(true);
    for (const row of series) expect(row.f107Average).toBeGreaterThan(60);
  });

  it('high solar activity shortens the lifetime against low (cycle amplitude ±2σ)', () => {
    const life = (solarActivity: string) =>
      num(outputsOf('drag-decay', { ...base, altitudeKm: 450, solarActivity }), 'lifetimeYears');
    expect(life('high')).toBeLessThan(life('moderate'));
    expect(life('moderate')).toBeLessThan(life('low'));
  });

  it('an orbit still up after 100 years is reported as a 100-year lower bound with a warning and no re-entry date', () => {
    const r = resultOf('drag-decay', { ...base, altitudeKm: 900, massKg: 1000 });
    expect(num(r.outputs, 'lifetimeYears')).toBeCloseTo(100, 6);
    expect(r.outputs.reentersWithinHorizon).toBe(false);
    expect(r.outputs.reentryEpoch).toBe('');
    expect(r.warnings.join(' ')).toMatch(/lower bound/);
  }, 30_000);

  it('refuses a start before the built-in cycle with the cycle source', () => {
    expectFieldError('drag-decay', { ...base, altitudeKm: 450, startEpoch: '2001-01-01T00:00:00Z' }, 'startEpoch');
  });
});

import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf } from './helpers';

describe('repeat-orbit', () => {
  it('Landsat 8 WRS-2 (USGS Landsat 8 Data Users Handbook): 233 rev / 16 d → a ≈ 7077.7 km, i ≈ 98.2°, 98.9 min', () => {
    const out = outputsOf('repeat-orbit', { revolutions: 233, days: 16 });
    expect(Math.abs(num(out, 'semiMajorAxisKm') - 7077.7)).toBeLessThan(1);
    expect(Math.abs(num(out, 'inclinationDeg') - 98.2)).toBeLessThan(0.03);
    expect(Math.abs(num(out, 'nodalPeriodMin') - 98.9)).toBeLessThan(0.05);
    // WRS-2 path spacing at the equator 40075 km / 233 ≈ 172 km, node step 360°·16/233 = 24.72°
    expect(num(out, 'equatorSpacingKm')).toBeCloseTo(172.0, 1);
    expect(num(out, 'nodeShiftDeg')).toBeCloseTo((360 * 16) / 233, 6);
  });

  // ESA Sentinel-1 User Handbook (2013): 175 orbits in 12 days, 693 km, 98.18° (from memory)
  // CNES SPOT: 369 orbits in 26 days, 822 km, 98.7° (from memory)
  // ESA Sentinel-2 User Handbook (2015): 143 orbits in 10 days, 786 km, 98.62° (from memory; our first-order
  //   mean inclination is 98.55°, so the inclination tolerance there is 0.1°)
  it.each([
    { mission: 'Sentinel-1', revolutions: 175, days: 12, altitudeKm: 693, inclinationDeg: 98.18, incTol: 0.05 },
    { mission: 'SPOT', revolutions: 369, days: 26, altitudeKm: 822, inclinationDeg: 98.7, incTol: 0.05 },
    { mission: 'Sentinel-2', revolutions: 143, days: 10, altitudeKm: 786, inclinationDeg: 98.62, incTol: 0.1 },
  ])(
    '$mission: $revolutions rev / $days d → $altitudeKm km (±3 km)',
    ({ revolutions, days, altitudeKm, inclinationDeg, incTol }) => {
      const out = outputsOf('repeat-orbit', { revolutions, days });
      expect(Math.abs(num(out, 'altitudeKm') - altitudeKm)).toBeLessThan(3);
      expect(Math.abs(num(out, 'inclinationDeg') - inclinationDeg)).toBeLessThan(incTol);
    },
  );

  it('daily-repeat SSOs near 890 km (14 rev/day) and near 1260 km at about 100.7° (13 rev/day) — common practice figures', () => {
    const r14 = outputsOf('repeat-orbit', { revolutions: 14, days: 1 });
    const r13 = outputsOf('repeat-orbit', { revolutions: 13, days: 1 });
    expect(Math.abs(num(r14, 'altitudeKm') - 890)).toBeLessThan(10);
    expect(Math.abs(num(r13, 'altitudeKm') - 1260)).toBeLessThan(10);
    expect(Math.abs(num(r13, 'inclinationDeg') - 100.7)).toBeLessThan(0.1);
  });

  it('the solution satisfies the repeat condition R·T_N = D·T_ND to 1e-9', () => {
    const out = outputsOf('repeat-orbit', { revolutions: 233, days: 16 });
    const ratio = (233 * num(out, 'nodalPeriodMin') * 60) / (16 * num(out, 'nodalDayHours') * 3600);
    expect(Math.abs(ratio - 1)).toBeLessThan(1e-9);
    // SSO: the nodal day equals the mean solar day to within 0.05 s
    expect(Math.abs(num(out, 'nodalDayHours') * 3600 - 86400)).toBeLessThan(0.05);
  });

  it('fixed inclination: TOPEX/Poseidon-like 127 rev / 10 nodal days at 66.04° (prograde, so the nodal day is shorter than 24 h)', () => {
    // TOPEX/Poseidon: 127 revolutions in ~10 days at 66° and a ≈ 7714 km (AVISO/JPL mission description, from memory)
    const out = outputsOf('repeat-orbit', { revolutions: 127, days: 10, inclinationDeg: 66.04 });
    expect(Math.abs(num(out, 'semiMajorAxisKm') - 7714.4)).toBeLessThan(3);
    expect(num(out, 'nodalDayHours')).toBeLessThan(23.9);
    expect(num(out, 'nodalDayHours')).toBeGreaterThan(23.7);
    expect(out.sunSynchronous).toBe(false);
  });

  it('rejects non-coprime and zero revolutions/days, and unreachable repeats', () => {
    expect(expectFieldError('repeat-orbit', { revolutions: 234, days: 16 }, 'revolutions')).toMatch(
      /117 revolutions in 8 days/,
    );
    expectFieldError('repeat-orbit', { revolutions: 0, days: 1 }, 'revolutions');
    expectFieldError('repeat-orbit', { revolutions: 15, days: 0 }, 'days');
    expectFieldError('repeat-orbit', { revolutions: 17, days: 1 }, 'revolutions'); // below 100 km
    expectFieldError('repeat-orbit', { revolutions: 3, days: 1 }, 'revolutions'); // no SSO that high
    expectFieldError('repeat-orbit', { revolutions: 14.5, days: 1 }, 'revolutions');
  });
});

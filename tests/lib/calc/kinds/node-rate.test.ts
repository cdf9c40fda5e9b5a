import { describe, expect, it } from 'vitest';
import { semiMajorAxisFromRevPerDay, sgp4NodeRateFor } from '../support/sgp4';
import { runCalc } from '../../../../lib/calc/index';
import { num, outputsOf } from './helpers';

describe('node-rate', () => {
  it('agrees with SGP4 (satellite.js 7.1.0) node drift of a hand-built 98.2° TLE within 1.5 %', () => {
    // SGP4 includes J2², J4 and uses WGS-72 constants, hence the 1.5 % tolerance.
    const tle = {
      inclinationDeg: 98.2,
      raanDeg: 100,
      eccentricity: 0.0001,
      argPerigeeDeg: 90,
      meanAnomalyDeg: 0,
      meanMotionRevPerDay: 14.57,
      epochYear: 2024,
      epochDay: 100.5,
    };
    const sgp4Rate = sgp4NodeRateFor(tle, 10);
    const ours = num(
      outputsOf('node-rate', {
        altitudeKm: semiMajorAxisFromRevPerDay(14.57) - 6378.137,
        inclinationDeg: 98.2,
        eccentricity: 0.0001,
      }),
      'nodeRateDegPerDay',
    );
    expect(sgp4Rate).toBeGreaterThan(0.9);
    expect(Math.abs(ours / sgp4Rate - 1)).toBeLessThan(0.015);
  });

  it('agrees with SGP4 for a prograde 51.6° orbit (negative node rate) within 1.5 %', () => {
    const tle = {
      inclinationDeg: 51.6,
      raanDeg: 200,
      eccentricity: 0.0005,
      argPerigeeDeg: 30,
      meanAnomalyDeg: 10,
      meanMotionRevPerDay: 15.5,
      epochYear: 2024,
      epochDay: 10,
    };
    const sgp4Rate = sgp4NodeRateFor(tle, 5);
    const ours = num(
      outputsOf('node-rate', {
        altitudeKm: semiMajorAxisFromRevPerDay(15.5) - 6378.137,
        inclinationDeg: 51.6,
        eccentricity: 0.0005,
      }),
      'nodeRateDegPerDay',
    );
    expect(sgp4Rate).toBeLessThan(-4.5);
    expect(Math.abs(ours / sgp4Rate - 1)).toBeLessThan(0.015);
  });

  it('theory "j2": perigee rate vanishes at the critical inclination 63.435° (Vallado 4th ed. §9.6; 4 − 5 sin² i = 0)', () => {
    const crit = (Math.asin(Math.sqrt(0.8)) * 180) / Math.PI;
    expect(crit).toBeCloseTo(63.435, 3);
    expect(
      Math.abs(
        num(outputsOf('node-rate', { altitudeKm: 800, inclinationDeg: crit, theory: 'j2' }), 'perigeeRateDegPerDay'),
      ),
    ).toBeLessThan(1e-9);
  });

  it('theory "zonal": at 63.435° the perigee rate is only the J2² and J4 residue (≈ 0.002 °/d, vs 3 °/d at 98°) and the kind warns about the critical inclination', () => {
    const r = runCalc('node-rate', { altitudeKm: 800, inclinationDeg: 63.435 });
    if (!r.ok) throw new Error(r.error);
    expect(Math.abs(r.result.outputs.perigeeRateDegPerDay as number)).toBeLessThan(0.005);
    expect(r.result.warnings.join(' ')).toMatch(/critical inclination/);
  });

  it('local-time drift is about zero on the sun-synchronous inclination and ≈ 17.5 min/yr per 0.1° off it at 700 km', () => {
    const sso = num(outputsOf('sso-inclination', { altitudeKm: 700 }), 'inclinationDeg');
    expect(
      Math.abs(num(outputsOf('node-rate', { altitudeKm: 700, inclinationDeg: sso }), 'localTimeDriftMinPerYear')),
    ).toBeLessThan(1e-6);
    // Hand derivative: dΩ̇/di = (3/2) n J2 (R/a)² sin i = 1.398e-6 × 0.9898 rad/s per rad → 0.01195 °/day per 0.1° → ×1461 min/yr
    const drift = num(
      outputsOf('node-rate', { altitudeKm: 700, inclinationDeg: sso + 0.1 }),
      'localTimeDriftMinPerYear',
    );
    expect(drift).toBeGreaterThan(17.2);
    expect(drift).toBeLessThan(17.7);
  });

  it('states where it stops being valid and warns there: drag below 300 km, Sun and Moon above 3000 km, e above 0.05', () => {
    const note = runCalc('node-rate', {});
    if (!note.ok) throw new Error(note.error);
    expect(note.result.model.assumptions.join(' ')).toMatch(
      /Valid for near-circular orbits .* 300 km .* 3000 km .* critical inclinations/,
    );
    expect(note.result.warnings).toEqual([]);
    const warn = (inputs: Record<string, unknown>) => {
      const r = runCalc('node-rate', inputs);
      if (!r.ok) throw new Error(r.error);
      return r.result.warnings.join(' ');
    };
    expect(warn({ altitudeKm: 250 })).toMatch(/drag/);
    expect(warn({ altitudeKm: 3500 })).toMatch(/Sun and Moon/);
    expect(warn({ eccentricity: 0.1 })).toMatch(/above 0\.05/);
  });
});

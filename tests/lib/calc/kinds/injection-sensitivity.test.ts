import { describe, expect, it } from 'vitest';
import { semiMajorAxisFromRevPerDay, sgp4NodeRateFor } from '../support/sgp4';
import { expectFieldError, num, outputsOf } from './helpers';

const MIN_PER_YEAR_PER_DEG_PER_DAY = 365.24219 * 4;

describe('injection-sensitivity', () => {
  const base = {
    inclinationDeg: 98.188,
    raanDeg: 50,
    eccentricity: 0.0001,
    argPerigeeDeg: 90,
    meanAnomalyDeg: 0,
    meanMotionRevPerDay: 14.5612,
    epochYear: 2024,
    epochDay: 60,
  };
  const altitudeKm = semiMajorAxisFromRevPerDay(base.meanMotionRevPerDay) - 6378.137;

  it('drift from a +0.1° inclination error matches SGP4 (satellite.js 7.1.0) node-rate differences within 3 %', () => {
    const d = sgp4NodeRateFor({ ...base, inclinationDeg: 98.288 }, 10) - sgp4NodeRateFor(base, 10);
    const out = outputsOf('injection-sensitivity', {
      altitudeKm,
      inclinationDeg: 98.188,
      inclinationErrorDeg: 0.1,
      altitudeErrorKm: 0,
    });
    expect(Math.abs(num(out, 'driftFromInclinationMinPerYear') / (d * MIN_PER_YEAR_PER_DEG_PER_DAY) - 1)).toBeLessThan(
      0.03,
    );
    expect(num(out, 'driftFromAltitudeMinPerYear')).toBe(0);
  });

  it('drift from a +10 km altitude error matches SGP4 node-rate differences within 5 %', () => {
    const aHigh = semiMajorAxisFromRevPerDay(base.meanMotionRevPerDay) + 10;
    const nHigh = (Math.sqrt(398600.4418 / aHigh ** 3) * 86400) / (2 * Math.PI);
    const d = sgp4NodeRateFor({ ...base, meanMotionRevPerDay: nHigh }, 10) - sgp4NodeRateFor(base, 10);
    const out = outputsOf('injection-sensitivity', {
      altitudeKm,
      inclinationDeg: 98.188,
      inclinationErrorDeg: 0,
      altitudeErrorKm: 10,
    });
    expect(num(out, 'driftFromAltitudeMinPerYear')).toBeLessThan(0);
    expect(Math.abs(num(out, 'driftFromAltitudeMinPerYear') / (d * MIN_PER_YEAR_PER_DEG_PER_DAY) - 1)).toBeLessThan(
      0.05,
    );
  });

  it('plane change: 1° at 700 km costs ≈ 131 m/s (Δv ≈ v·Δi, common practice rule) and 2 v sin(Δi/2) exactly', () => {
    const out = outputsOf('injection-sensitivity', {
      altitudeKm: 700,
      inclinationDeg: 98.19,
      inclinationErrorDeg: -1,
      altitudeErrorKm: 0,
    });
    const v = Math.sqrt(398600.4418 / 7078.137) * 1000;
    expect(num(out, 'planeChangeDeltaVMps')).toBeCloseTo(2 * v * Math.sin(Math.PI / 360), 6);
    expect(Math.abs(num(out, 'planeChangeDeltaVMps') - 131)).toBeLessThan(1.5);
  });

  it('combined drift is close to the sum of the two effects (small errors) and warns for a non-SSO nominal orbit', () => {
    const r = outputsOf('injection-sensitivity', {
      altitudeKm: 700,
      inclinationDeg: 98.188,
      inclinationErrorDeg: 0.02,
      altitudeErrorKm: -3,
    });
    expect(num(r, 'localTimeDriftMinPerYear')).toBeCloseTo(
      num(r, 'driftFromInclinationMinPerYear') + num(r, 'driftFromAltitudeMinPerYear'),
      1,
    );
    expectFieldError(
      'injection-sensitivity',
      { altitudeKm: 120, inclinationDeg: 98, inclinationErrorDeg: 0, altitudeErrorKm: -30 },
      'altitudeErrorKm',
    );
  });
});

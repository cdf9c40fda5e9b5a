import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf } from './helpers';

type Row = Record<string, number | string | boolean>;

describe('orbit-trade', () => {
  const inputs = {
    candidateAltitudesKm: '600, 650, 693, 720',
    chosenIndex: 3,
    ltanHours: 22.5,
    massKg: 310,
    areaM2: 1.6,
  };

  it('finds the 175-revolution, 12-day repeat next to 693 km (Sentinel-1 reference orbit: 175 orbits per 12-day cycle at 693 km, ESA Sentinel-1 User Handbook, 2013, section "Orbit")', () => {
    const out = outputsOf('orbit-trade', inputs);
    const rows = out.candidates as Row[];
    expect(rows).toHaveLength(4);
    expect(rows[2].nearestRepeat).toMatch(/^175\/12 @ 69[2-4]\.\d$/);
    expect(rows.map((r) => r.chosen)).toEqual([false, false, true, false]);
    expect(num(out, 'chosenAltitudeKm')).toBe(693);
  });

  it('every column equals the engine’s own constituent kinds for that altitude (cross-check)', () => {
    const rows = outputsOf('orbit-trade', inputs).candidates as Row[];
    for (const r of rows) {
      const alt = r.altitudeKm as number;
      const sso = outputsOf('sso-inclination', { altitudeKm: alt });
      expect(r.inclinationDeg).toBe(sso.inclinationDeg);
      expect(r.nodalPeriodMin).toBe(sso.nodalPeriodMin);
      const drag = outputsOf('drag-decay', {
        altitudeKm: alt,
        massKg: 310,
        areaM2: 1.6,
        dragCoefficient: 2.2,
        solarActivity: 'moderate',
        atmosphere: 'exponential',
      });
      expect(r.lifetimeDays).toBe(drag.lifetimeDays);
      const drift = outputsOf('injection-sensitivity', {
        altitudeKm: alt,
        inclinationDeg: sso.inclinationDeg,
        inclinationErrorDeg: 0.01,
        altitudeErrorKm: 0,
      });
      expect(r.driftPerHundredthDegMinPerYear).toBe(drift.driftFromInclinationMinPerYear);
    }
    // Higher orbits: lower drag, longer life, less make-up ΔV (monotone, physical expectation).
    const dv = rows.map((r) => r.maintenanceDeltaVMpsPerYear as number);
    expect([...dv].sort((a, b) => b - a)).toEqual(dv);
  });

  it('the inclination-hold column is the solar-inclination-drift kind at the candidate, and the total adds it to the drag make-up', () => {
    const rows = outputsOf('orbit-trade', inputs).candidates as Row[];
    for (const r of rows) {
      const hold = outputsOf('solar-inclination-drift', {
        altitudeKm: r.altitudeKm,
        inclinationDeg: r.inclinationDeg,
        ltanHours: 22.5,
        startEpoch: '2027-01-01T00:00:00Z',
      });
      expect(r.inclinationHoldDeltaVMpsPerYear).toBe(hold.inclinationHoldDeltaVMpsPerYear);
      expect(r.totalMaintenanceDeltaVMpsPerYear).toBeCloseTo(
        (r.maintenanceDeltaVMpsPerYear as number) + (r.inclinationHoldDeltaVMpsPerYear as number),
        12,
      );
      // 22:30 at 600–720 km: a few m/s per year (issue #15 quotes ≈ 4.3 m/s/yr at 700 km)
      expect(r.inclinationHoldDeltaVMpsPerYear).toBeGreaterThan(3.5);
      expect(r.inclinationHoldDeltaVMpsPerYear).toBeLessThan(5);
    }
  });

  it('refuses malformed candidate lists and a chosen index past the end, naming the field', () => {
    expect(expectFieldError('orbit-trade', { candidateAltitudesKm: '600' }, 'candidateAltitudesKm')).toMatch(
      /2 to 8 altitudes/,
    );
    expect(expectFieldError('orbit-trade', { candidateAltitudesKm: '600, lots' }, 'candidateAltitudesKm')).toMatch(
      /“lots” is not an altitude/,
    );
    expect(expectFieldError('orbit-trade', { candidateAltitudesKm: '600, 3000' }, 'candidateAltitudesKm')).toMatch(
      /outside 200–1500 km/,
    );
    expect(
      expectFieldError('orbit-trade', { candidateAltitudesKm: '600, 650', chosenIndex: 3 }, 'chosenIndex'),
    ).toMatch(/only 2 candidates/);
  });
});

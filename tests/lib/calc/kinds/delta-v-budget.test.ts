import { describe, expect, it } from 'vitest';
import { runCalc } from '../../../../lib/calc/index';
import { num, outputsOf } from './helpers';

describe('delta-v-budget', () => {
  it("adds a hand-worked budget (worked by hand below, not with the kind's code; to 1e-9 m/s)", () => {
    // A 7-year mission: injection correction 6.50 m/s; inclination held at 3.80 m/s per year → 26.60 m/s;
    // altitude maintenance 1.25 m/s per year → 8.75 m/s; disposal 52.00 m/s.
    // Sum 6.50 + 26.60 + 8.75 + 52.00 = 93.85 m/s; margin 15 % of 93.85 = 14.0775 m/s; total 107.9275 m/s.
    const out = outputsOf('delta-v-budget', {
      injectionCorrectionMps: 6.5,
      inclinationHoldMpsPerYear: 3.8,
      altitudeMaintenanceMpsPerYear: 1.25,
      missionYears: 7,
      disposalMps: 52,
      marginPercent: 15,
    });
    expect(num(out, 'inclinationMps')).toBeCloseTo(26.6, 9);
    expect(num(out, 'altitudeMaintenanceMps')).toBeCloseTo(8.75, 9);
    expect(num(out, 'subtotalMps')).toBeCloseTo(93.85, 9);
    expect(num(out, 'marginMps')).toBeCloseTo(14.0775, 9);
    expect(num(out, 'totalDeltaVMps')).toBeCloseTo(107.9275, 9);
    const table = out.table as { line: string; basis: string; deltaVMps: number }[];
    expect(table.map((r) => r.line)).toEqual([
      'Injection correction (3σ)',
      'Inclination hold or bias',
      'Altitude maintenance',
      'Disposal',
      'Margin',
    ]);
    expect(table[1].basis).toBe('3.80 m/s per year × 7 years');
    expect(table.reduce((sum, r) => sum + r.deltaVMps, 0)).toBeCloseTo(107.9275, 9);
  });

  it('a bias strategy: no yearly hold, one trim counted once (2.40 + 0 + 1.10 + 0.90·5 = 8.00; +10 % → 8.80 m/s)', () => {
    const out = outputsOf('delta-v-budget', {
      injectionCorrectionMps: 2.4,
      inclinationTrimMps: 1.1,
      altitudeMaintenanceMpsPerYear: 0.9,
      missionYears: 5,
    });
    expect(num(out, 'totalDeltaVMps')).toBeCloseTo(8.8, 9);
  });

  it('refuses a negative line or margin, naming the field', () => {
    const r = runCalc('delta-v-budget', { disposalMps: -1 });
    expect(r.ok ? 'ok' : Object.keys(r.fields)).toEqual(['disposalMps']);
    const m = runCalc('delta-v-budget', { marginPercent: 500 });
    expect(m.ok ? 'ok' : Object.keys(m.fields)).toEqual(['marginPercent']);
  });
});

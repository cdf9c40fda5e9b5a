/**
 * Verdict and margin of a requirement. Each expected value is worked by
 * hand in the comment beside it (unit conversions: 1 h = 60 min, 1 km =
 * 1000 m, 1 yr as mathjs defines it, 365.25 d — only used where stated);
 * tolerances are exact to the 12 significant digits the margin keeps.
 */
import { describe, expect, it } from 'vitest';
import { checkRequirement, type RequirementOutput } from '@/lib/requirements/check-requirement';

const km = (value: unknown, precision = 1): RequirementOutput => ({
  field: { label: 'Mean altitude', unit: 'km', precision, type: 'number' },
  value,
});
const hours = (value: number): RequirementOutput => ({
  field: { label: 'Local time of descending node', unit: 'h', precision: 4, type: 'number' },
  value,
});

describe('checkRequirement: one hand example per comparison', () => {
  it('≤: 692.8 km against 700 km leaves 7.2 km', () => {
    expect(checkRequirement({ comparison: 'le', threshold: '700 km', tolerance: '' }, km(692.84))).toEqual({
      status: 'pass',
      value: 692.8,
      threshold: 700,
      margin: 7.2,
    });
  });

  it('≥: 692.8 km against 0.7 Mm (= 700 km) is 7.2 km short', () => {
    expect(checkRequirement({ comparison: 'ge', threshold: '0.7 Mm', tolerance: '' }, km(692.84))).toEqual({
      status: 'fail',
      value: 692.8,
      threshold: 700,
      margin: -7.2,
    });
  });

  it('=: a 12-day cycle (integer) equals 12 and misses 16 by 4', () => {
    const days: RequirementOutput = {
      field: { label: 'Repeat cycle', unit: 'd', precision: 0, type: 'integer' },
      value: 12,
    };
    expect(checkRequirement({ comparison: 'eq', threshold: '12', tolerance: '' }, days)).toMatchObject({
      status: 'pass',
      margin: 0,
    });
    expect(checkRequirement({ comparison: 'eq', threshold: '16 d', tolerance: '' }, days)).toMatchObject({
      status: 'fail',
      margin: -4,
    });
  });

  it('within ±: descending node at 10.6 h against 10.5 h ± 15 min (0.25 h) leaves 0.15 h (9 min)', () => {
    const v = checkRequirement({ comparison: 'within', threshold: '10.5 h', tolerance: '15 min' }, hours(10.6));
    expect(v).toMatchObject({ status: 'pass', value: 10.6, threshold: 10.5, tolerance: 0.25 });
    expect(v.status !== 'undecided' && v.margin).toBeCloseTo(0.15, 12);
  });

  it('within ±: 10:12 (10.2 h) against 10:30 ± 15 min is 3 min (0.05 h) outside, below the band', () => {
    const v = checkRequirement({ comparison: 'within', threshold: '630 min', tolerance: '0.25 h' }, hours(10.2));
    expect(v.status).toBe('fail');
    expect(v.status !== 'undecided' && v.margin).toBeCloseTo(-0.05, 12);
  });
});

describe('boundaries are decided on the value as displayed', () => {
  it('≤ 700 km: 700.04 km shows as 700.0 km and passes with margin 0; 700.06 km shows as 700.1 km and fails by 0.1 km', () => {
    expect(checkRequirement({ comparison: 'le', threshold: '700', tolerance: '' }, km(700.04))).toMatchObject({
      status: 'pass',
      margin: 0,
    });
    expect(checkRequirement({ comparison: 'le', threshold: '700', tolerance: '' }, km(700.06))).toMatchObject({
      status: 'fail',
      margin: -0.1,
    });
  });

  it('≥ 700 km: exactly 700 passes with margin 0; 699.94 km (699.9 shown) fails', () => {
    expect(checkRequirement({ comparison: 'ge', threshold: '700 km', tolerance: '' }, km(700))).toMatchObject({
      status: 'pass',
      margin: 0,
    });
    expect(checkRequirement({ comparison: 'ge', threshold: '700 km', tolerance: '' }, km(699.94))).toMatchObject({
      status: 'fail',
      margin: -0.1,
    });
  });

  it('within ±: exactly on the edge of the band (10.75 h against 10.5 h ± 15 min) passes with margin 0', () => {
    expect(
      checkRequirement({ comparison: 'within', threshold: '10.5', tolerance: '15 min' }, hours(10.75)),
    ).toMatchObject({ status: 'pass', margin: 0 });
  });

  it('=: 98.17671° shown at 3 decimals as 98.177° equals 98.177 but not 98.176', () => {
    const deg: RequirementOutput = {
      field: { label: 'Inclination', unit: 'deg', precision: 3, type: 'number' },
      value: 98.17671,
    };
    expect(checkRequirement({ comparison: 'eq', threshold: '98.177 deg', tolerance: '' }, deg).status).toBe('pass');
    expect(checkRequirement({ comparison: 'eq', threshold: '98.176', tolerance: '' }, deg).status).toBe('fail');
  });
});

describe('what cannot be decided is said, never guessed', () => {
  it('refuses a threshold in another dimension than the output (a length against hours)', () => {
    const v = checkRequirement({ comparison: 'le', threshold: '5 km', tolerance: '' }, hours(10.5));
    expect(v).toEqual({
      status: 'undecided',
      reason: expect.stringMatching(/threshold: “5 km” is not a duration; the output is in h/),
    });
  });

  it('refuses a tolerance in the wrong unit, a missing tolerance, and a negative one', () => {
    expect(
      checkRequirement({ comparison: 'within', threshold: '10.5 h', tolerance: '3 kg' }, hours(10.5)),
    ).toMatchObject({ status: 'undecided', reason: expect.stringMatching(/^tolerance:/) });
    expect(checkRequirement({ comparison: 'within', threshold: '10.5 h', tolerance: '' }, hours(10.5))).toEqual({
      status: 'undecided',
      reason: 'no tolerance given',
    });
    expect(checkRequirement({ comparison: 'within', threshold: '10.5 h', tolerance: '-5 min' }, hours(10.5))).toEqual({
      status: 'undecided',
      reason: 'the tolerance must not be negative',
    });
  });

  it('refuses a missing threshold, a non-numeric output and a missing value', () => {
    expect(checkRequirement({ comparison: 'le', threshold: ' ', tolerance: '' }, km(700))).toEqual({
      status: 'undecided',
      reason: 'no threshold given',
    });
    const flag: RequirementOutput = {
      field: { label: 'Sun-synchronous', unit: null, precision: 0, type: 'boolean' },
      value: true,
    };
    expect(checkRequirement({ comparison: 'eq', threshold: '1', tolerance: '' }, flag)).toMatchObject({
      status: 'undecided',
      reason: expect.stringMatching(/is not a number/),
    });
    expect(checkRequirement({ comparison: 'le', threshold: '700', tolerance: '' }, km(Number.NaN))).toMatchObject({
      status: 'undecided',
    });
  });

  it("reads years and per-year rates in the engine's unit names (yr, min/yr)", () => {
    const years: RequirementOutput = {
      field: { label: 'Lifetime', unit: 'yr', precision: 2, type: 'number' },
      value: 19.5,
    };
    expect(checkRequirement({ comparison: 'le', threshold: '25 yr', tolerance: '' }, years)).toMatchObject({
      status: 'pass',
      margin: 5.5,
    });
    const drift: RequirementOutput = {
      field: { label: 'Drift', unit: 'min/yr', precision: 2, type: 'number' },
      value: 5.17,
    };
    // 10 min/yr tolerance around 0: |5.17| inside by 4.83 min/yr
    expect(checkRequirement({ comparison: 'within', threshold: '0', tolerance: '10 min/yr' }, drift)).toMatchObject({
      status: 'pass',
      margin: 4.83,
    });
  });
});

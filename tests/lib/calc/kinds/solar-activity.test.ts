/**
 * solar-activity kind: wiring of the cycle model (its outside checks are in
 * tests/lib/calc/topics/solar-activity/solar-cycle.test.ts), the monthly series, levels and refusals.
 */
import { describe, expect, it } from 'vitest';
import { expectFieldError, num, outputsOf, resultOf, rows } from './helpers';

describe('solar-activity', () => {
  it('gives F10.7, its mean and Ap at the date, and a monthly series from the date (first row = the date)', () => {
    const out = outputsOf('solar-activity', { epoch: '2025-06-15T00:00:00Z', years: 2 });
    const series = rows(out, 'series');
    expect(series).toHaveLength(25); // 15 June 2025, then 1 July 2025 … 1 June 2027
    expect(series[0].f107Average).toBeCloseTo(num(out, 'f107Average'), 12);
    expect(num(out, 'f107')).toBe(num(out, 'f107Average'));
    expect(num(out, 'ap')).toBe(12);
    expect(String(series[1].date)).toBe('2025-07-01T00:00:00.000Z');
    // SILSO smoothed sunspot number 124.7 (±5 %) for June 2025
    expect(Math.abs(num(out, 'sunspotNumber') / 124.7 - 1)).toBeLessThan(0.05);
  });

  it('high > mean > low in the current cycle; Ap follows its input', () => {
    const f = (level: string) =>
      num(outputsOf('solar-activity', { epoch: '2027-06-01T00:00:00Z', level }), 'f107Average');
    expect(f('high')).toBeGreaterThan(f('mean'));
    expect(f('mean')).toBeGreaterThan(f('low'));
    expect(num(outputsOf('solar-activity', { apMean: 20 }), 'ap')).toBe(20);
  });

  it('warns when the series runs into cycles not yet begun, and cites its sources without "from memory"', () => {
    const r = resultOf('solar-activity', { epoch: '2027-01-01T00:00:00Z', years: 10 });
    expect(r.warnings.join(' ')).toMatch(/not begun/);
    expect(r.model.references.join(' ')).toMatch(/Solar Physics 151 \(1994\) 177/);
    expect(JSON.stringify(r.model)).not.toMatch(/from memory/i);
    expect(r.model.assumptions.join(' ')).toMatch(/Preliminary-design model/);
  });

  it('says when a level cannot act (dates in the built-in cycle 24)', () => {
    expect(
      resultOf('solar-activity', { epoch: '2012-01-01T00:00:00Z', years: 2, level: 'high' }).warnings.join(' '),
    ).toMatch(/no effect/);
  });

  it.each([
    [{ epoch: '2005-01-01T00:00:00Z' }, 'epoch', /December 2008/],
    [{ cycleStartEpoch: '2009-01-01T00:00:00Z' }, 'cycleStartEpoch', /must start after 2016-01-01/],
    [{ years: 80 }, 'years', /at most 50 yr/],
    [{ level: 'extreme' }, 'level', /one of low, mean, high/],
    [{ cycleMaxSunspotNumber: 5 }, 'cycleMaxSunspotNumber', /at least 20/],
  ])('refuses %j naming %s', (inputs, field, message) => {
    expect(expectFieldError('solar-activity', inputs, field)).toMatch(message);
  });
});

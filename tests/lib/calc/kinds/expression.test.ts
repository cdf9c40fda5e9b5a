import { describe, expect, it } from 'vitest';
import { computeMeanMotion } from '../../../../lib/calc/topics/secular-rates';
import { expectFieldError, num, outputsOf } from './helpers';

describe('expression', () => {
  it('mathjs documentation (Units): "5.08 cm + 2 inch" = 10.16 cm and "12.7 cm to inch" = 5 inch', () => {
    const a = outputsOf('expression', { expression: '5.08 cm + 2 inch' });
    expect(num(a, 'value')).toBeCloseTo(10.16, 10);
    expect(a.unit).toBe('cm');
    expect(num(outputsOf('expression', { expression: '12.7 cm to inch' }), 'value')).toBeCloseTo(5, 10);
    expect(num(outputsOf('expression', { expression: 'sqrt(3^2 + 4^2)' }), 'value')).toBe(5);
  });

  it("Kepler period 2π√(a³/μ) with units equals 2π/n from the engine's mean motion (another path), and is J2-shorter than the nodal period", () => {
    const out = outputsOf('expression', {
      expression: '2 pi sqrt(a^3 / mu)',
      values: { a: '7078.137 km', mu: '398600.4418 km^3/s^2' },
      unit: 'min',
    });
    expect(out.unit).toBe('min');
    expect(num(out, 'value')).toBeCloseTo((2 * Math.PI) / computeMeanMotion(7078.137) / 60, 9);
    const nodal = num(outputsOf('sso-inclination', { altitudeKm: 700 }), 'nodalPeriodMin');
    expect(nodal / num(out, 'value') - 1).toBeGreaterThan(0);
    expect(nodal / num(out, 'value') - 1).toBeLessThan(0.002);
    expect(String(out.text)).toMatch(/^98\.77\d* min$/);
  });

  it('without a result unit the units simplify (s, km / s)', () => {
    const v = outputsOf('expression', {
      expression: 'sqrt(mu / a)',
      values: { a: '7078.137 km', mu: '398600.4418 km^3/s^2' },
    });
    expect(v.unit).toBe('km / s');
    expect(num(v, 'value')).toBeCloseTo(7.5043, 4);
  });

  it('restricted instance: import, createUnit, evaluate, parse, assignments, matrices and property access are refused (mathjs Security docs)', () => {
    for (const expression of [
      'import({x: 1})',
      'createUnit("foo")',
      'evaluate("1+1")',
      'parse("1")',
      'x = 2',
      'f(x) = x',
      '[1, 2]',
      'ones(1000, 1000)',
      'a.b',
      '"text"',
    ]) {
      expectFieldError('expression', { expression, values: { a: '1' } }, 'expression');
    }
  });

  it('parse errors, unknown names, division by zero and unit mismatches name the field', () => {
    expect(expectFieldError('expression', { expression: '2 +* 3' }, 'expression')).toMatch(/cannot be parsed/);
    expect(expectFieldError('expression', { expression: 'a * q', values: { a: '1 km' } }, 'expression')).toMatch(/q/);
    expectFieldError('expression', { expression: '1 / 0' }, 'expression');
    expectFieldError('expression', { expression: 'a', values: { a: '3 km' }, unit: 's' }, 'unit');
    expectFieldError('expression', { expression: 'a', values: { a: '3 km +' } }, 'values');
    expectFieldError('expression', { expression: 'a', values: { 'not a name': '3' } }, 'values');
  });
});

import { describe, expect, it } from 'vitest';
import { formatValue, formatNumber } from '@/lib/format/format-output';

describe('formatValue (display of engine outputs)', () => {
  it('uses the output precision as decimals and the unit symbol', () => {
    expect(formatValue(98.18629, 'deg', 3)).toBe('98.186°');
    expect(formatValue(699.5852, 'km', 1)).toBe('699.6 km');
    expect(formatValue(-0.00001, 'km', 2)).toBe('-1.000×10⁻⁵ km');
    expect(formatValue(true, null, 0)).toBe('yes');
  });
  it('shows a vector output component by component in its unit', () => {
    expect(formatValue([7086.2813, 0, -12.5], 'km', 3)).toBe('(7086.281, 0.000, -12.500) km');
    expect(formatValue([1.8e-15, -1.7e-12, 7.4264531], 'km/s', 4)).toBe('(0.0000, 0.0000, 7.4265) km/s');
    expect(formatValue([{ a: 1 }, { a: 2 }], null, 0)).toBe('2 rows');
  });
  it('shows tiny densities in scientific notation rather than zeros', () => {
    expect(formatNumber(2.345e-13, 12)).toBe('2.345×10⁻¹³');
    expect(formatNumber(0, 3)).toBe('0.000');
    expect(formatNumber(-0.0001, 2)).toBe('-1.000×10⁻⁴');
  });
});

/** Display of engine values: a number at its output's display precision, with its unit. */

const UNIT_DISPLAY: Record<string, string> = {
  deg: '°',
  'deg/d': '°/day',
  'deg/day': '°/day',
  h: 'h',
  d: 'days',
  'kg/m^3': 'kg/m³',
  'm^2': 'm²',
  'km^2': 'km²',
  percent: '%',
  '%': '%',
};

export function displayUnit(unit: string | null | undefined): string {
  if (!unit) return '';
  return UNIT_DISPLAY[unit] ?? unit.replace(/\^2/g, '²').replace(/\^3/g, '³');
}

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** A power of ten's exponent ("-3", "+07") in superscript digits: "⁻³", "⁷". */
export function superscriptExponent(exponent: string): string {
  return [...String(Number(exponent))].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

export function formatNumber(value: number, precision: number): string {
  if (!Number.isFinite(value)) return '—';
  const abs = Math.abs(value);
  // Very small or very large values read better in scientific notation (e.g. densities in kg/m³):
  // below 10⁻³ the display precision (decimals) would show only zeros, so show four significant digits.
  if (abs !== 0 && (abs < 1e-3 || abs >= 1e9)) {
    const [mantissa, exponent] = value.toExponential(3).split('e');
    return `${mantissa}×10${superscriptExponent(exponent)}`;
  }
  const text = value.toFixed(Math.max(0, Math.min(precision, 12)));
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** "98.19°", "699.6 km", "true" … */
export function formatValue(value: unknown, unit: string | null | undefined, precision: number): string {
  if (typeof value === 'number') {
    const u = displayUnit(unit);
    const n = formatNumber(value, precision);
    return u === '°' || u === '%' ? `${n}${u}` : u ? `${n} ${u}` : n;
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && value.length > 0 && value.every((x) => typeof x === 'number')) {
    const u = displayUnit(unit);
    // components in fixed decimals (a position's 1e-12 km rounding noise reads as 0.000, not in scientific notation)
    const fixed = (x: number) => {
      const text = Number.isFinite(x) ? x.toFixed(Math.max(0, Math.min(precision, 12))) : '—';
      return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
    };
    return `(${value.map((x: number) => fixed(x)).join(', ')})${u ? ` ${u}` : ''}`;
  }
  if (Array.isArray(value)) return `${value.length} rows`;
  return '—';
}

import { create, all, type Unit } from 'mathjs';
import type { CalcInputField } from '@/lib/calc';

const math = create(all, {});
// The engine names years 'yr' (mission length, lifetimes); mathjs knows only 'year' (Julian year, 365.25 d).
math.createUnit('yr', { definition: '1 year', aliases: ['yrs'] });

/** Units as the engine names them → the mathjs unit they mean ('d' is not a mathjs unit), in a field's unit or in typed text ("16 d", "m/d"). */
const toMathjsUnit = (unit: string) => unit.replace(/\bd\b/g, 'day');

export type ParsedInput =
  { ok: true; value: number | string | undefined; normalised: string | null } | { ok: false; message: string };

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Reads what an analyst typed into a calc block field. Numbers may carry any
 * unit of the same dimension as the field (`705 km`, `0.705 Mm`, `1.7 rad`,
 * `2 days`); a bare number is taken in the field's unit. Empty text means
 * "not given" (the kind's default applies). The result is in the field's unit.
 */
export function parseInputText(field: CalcInputField, text: string): ParsedInput {
  const t = text.trim();
  if (t === '') return { ok: true, value: undefined, normalised: null };
  switch (field.type) {
    case 'number':
    case 'integer': {
      let value: number;
      if (NUMBER.test(t)) {
        value = Number(t);
      } else if (field.unit) {
        let u: Unit;
        try {
          u = math.unit(toMathjsUnit(t));
        } catch {
          return { ok: false, message: `“${t}” is not a number with a unit; write e.g. 12.5 ${field.unit}` };
        }
        const target = toMathjsUnit(field.unit);
        if (!u.equalBase(math.unit(1, target)))
          return { ok: false, message: `“${t}” is not a ${dimensionWord(field.unit)}; the field is in ${field.unit}` };
        if (u.value === null) return { ok: false, message: `“${t}” has a unit but no number` };
        value = u.toNumber(target);
      } else {
        return { ok: false, message: `“${t}” is not a number` };
      }
      if (!Number.isFinite(value)) return { ok: false, message: `“${t}” is not a finite number` };
      if (field.type === 'integer' && !Number.isInteger(round12(value)))
        return { ok: false, message: `${field.label} must be a whole number` };
      const v = field.type === 'integer' ? Math.round(value) : round12(value);
      return { ok: true, value: v, normalised: field.unit ? `${formatPlain(v)} ${field.unit}` : formatPlain(v) };
    }
    case 'enum':
      if (field.options && !field.options.includes(t))
        return { ok: false, message: `choose one of ${field.options.join(', ')}` };
      return { ok: true, value: t, normalised: t };
    case 'epoch': {
      const ms = Date.parse(t);
      if (!/^\d{4}-\d{2}-\d{2}/.test(t) || Number.isNaN(ms))
        return { ok: false, message: `“${t}” is not an ISO 8601 date and time such as 2027-03-21T10:30:00Z` };
      return { ok: true, value: t, normalised: new Date(ms).toISOString().replace('.000Z', 'Z') };
    }
    default:
      return { ok: true, value: t, normalised: t };
  }
}

/** Removes binary noise from unit conversion (e.g. 704.9999999999999 → 705). */
const round12 = (v: number) => Number(v.toPrecision(12));
const formatPlain = (v: number) => String(round12(v));

function dimensionWord(unit: string): string {
  if (['km', 'm', 'Mm'].includes(unit)) return 'length';
  if (['deg', 'rad'].includes(unit)) return 'angle';
  if (['h', 'd', 's', 'min'].includes(unit)) return 'duration';
  if (unit === 'kg') return 'mass';
  if (unit === 'm^2') return 'area';
  return `quantity in ${unit}`;
}

import { OrbitMessageError, type KvnEntry } from './orbit-message-types';

/** A KVN number: integer, fixed or floating point (CCSDS 502.0-B-3 §7.5.4–7.5.7). */
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

export interface NumberRule {
  /** The unit the standard gives the keyword (502.0-B-3 tables 3-3, 5-3); null for dimensionless values. */
  unit: string | null;
  min?: number;
  max?: number;
  /** true when min itself is not allowed. */
  minExclusive?: boolean;
  maxExclusive?: boolean;
}

/** Units compared as the standard writes them, ignoring case ("km**3/s**2", "m**2"). */
const sameUnit = (a: string, b: string) => a.replace(/\s+/g, '').toLowerCase() === b.replace(/\s+/g, '').toLowerCase();

/** Reads one number as text, naming the line and keyword when it is not a number. */
export function readNumberText(text: string, line: number, keyword: string): number {
  if (!NUMBER.test(text)) throw new OrbitMessageError(line, keyword, `"${text.slice(0, 40)}" is not a number`);
  const value = Number(text);
  if (!Number.isFinite(value))
    throw new OrbitMessageError(line, keyword, `"${text.slice(0, 40)}" is not a finite number`);
  return value;
}

/**
 * Reads the number of a keyword line, checks the unit in brackets (optional in
 * KVN, as the annex G2 examples show; when present it must be the standard's unit — the engine does
 * not convert) and the value's range. Throws OrbitMessageError naming line and keyword.
 */
export function readKvnNumber(entry: KvnEntry, rule: NumberRule): number {
  const { line, keyword } = entry;
  if (entry.unit !== null) {
    if (rule.unit === null) {
      if (!sameUnit(entry.unit, 'n/a') && entry.unit !== '')
        throw new OrbitMessageError(line, keyword, `has unit [${entry.unit}] but is dimensionless`);
    } else if (!sameUnit(entry.unit, rule.unit)) {
      throw new OrbitMessageError(line, keyword, `unit [${entry.unit}] where the standard requires [${rule.unit}]`);
    }
  }
  const value = readNumberText(entry.value, line, keyword);
  const unit = rule.unit ? ` ${rule.unit}` : '';
  if (rule.min !== undefined && (rule.minExclusive ? value <= rule.min : value < rule.min)) {
    throw new OrbitMessageError(
      line,
      keyword,
      `${entry.value}${unit} is below the accepted range (${rule.minExclusive ? 'more than' : 'at least'} ${rule.min}${unit})`,
    );
  }
  if (rule.max !== undefined && (rule.maxExclusive ? value >= rule.max : value > rule.max)) {
    throw new OrbitMessageError(
      line,
      keyword,
      `${entry.value}${unit} is above the accepted range (${rule.maxExclusive ? 'less than' : 'at most'} ${rule.max}${unit})`,
    );
  }
  return value;
}

import type { CalcOutputField } from '@/lib/calc';
import { parseInputText } from '@/lib/documents/parse-input-text';
import type { Comparison } from './requirement-attrs';

/** The output a requirement reads: its field (unit, display precision) and current value. */
export interface RequirementOutput {
  field: Pick<CalcOutputField, 'label' | 'unit' | 'precision' | 'type'>;
  value: unknown;
}

export type RequirementVerdict =
  | {
      status: 'pass' | 'fail';
      /** The output as displayed (rounded to its display precision), in the output's unit. */
      value: number;
      /** The threshold (≤, ≥, =) or the target (within ±), in the output's unit. */
      threshold: number;
      /** The tolerance of `within`, in the output's unit. */
      tolerance?: number;
      /**
       * How far inside the limit the value is, in the output's unit; negative
       * when outside. ≤: threshold − value; ≥: value − threshold; within:
       * tolerance − |value − target|; =: −|value − threshold| (0 when equal).
       */
      margin: number;
    }
  /** The requirement cannot be decided (no output chosen, no number, a threshold in the wrong unit …): why. */
  | { status: 'undecided'; reason: string };

/** A value rounded to `decimals` as the document shows it (toFixed, then back to a number). */
const asDisplayed = (v: number, decimals: number) => Number(v.toFixed(Math.max(0, Math.min(decimals, 12))));

/**
 * Decides a requirement: the output's value against a threshold typed with
 * a unit ("25 yr", "15 min", "700 km"; a bare number is in the output's
 * unit). A threshold or tolerance in another dimension than the output is
 * refused, as an undecided verdict naming it.
 *
 * The verdict is taken on the value as the memo displays it (rounded to the
 * output's display precision), so that the text never shows "25.00 yr ≤ 25 yr"
 * beside a failure; `=` holds when the displayed value equals the threshold
 * rounded the same way.
 */
export function checkRequirement(
  req: { comparison: Comparison; threshold: string; tolerance: string },
  output: RequirementOutput,
): RequirementVerdict {
  const { field } = output;
  if (field.type !== 'number' && field.type !== 'integer')
    return { status: 'undecided', reason: `${field.label} is not a number; a requirement compares a numeric output` };
  if (typeof output.value !== 'number' || !Number.isFinite(output.value))
    return { status: 'undecided', reason: `${field.label} has no numeric value` };
  const precision = field.type === 'integer' ? 0 : field.precision;
  const threshold = readQuantity(req.threshold, field.unit, req.comparison === 'within' ? 'target' : 'threshold');
  if (!threshold.ok) return { status: 'undecided', reason: threshold.reason };
  const value = asDisplayed(output.value, precision);
  const limit = asDisplayed(threshold.value, precision);
  switch (req.comparison) {
    case 'le':
      return verdict(value, threshold.value, limit - value);
    case 'ge':
      return verdict(value, threshold.value, value - limit);
    case 'eq':
      return verdict(value, threshold.value, -Math.abs(value - limit));
    case 'within': {
      const tolerance = readQuantity(req.tolerance, field.unit, 'tolerance');
      if (!tolerance.ok) return { status: 'undecided', reason: tolerance.reason };
      if (tolerance.value < 0) return { status: 'undecided', reason: 'the tolerance must not be negative' };
      return {
        ...verdict(value, threshold.value, asDisplayed(tolerance.value, precision) - Math.abs(value - limit)),
        tolerance: tolerance.value,
      };
    }
  }
}

function verdict(
  value: number,
  threshold: number,
  margin: number,
): Extract<RequirementVerdict, { status: 'pass' | 'fail' }> {
  // The difference of two displayed values carries binary noise (25.1 − 25 = 0.10000000000000142); round it off.
  const m = Number(margin.toPrecision(12));
  return { status: m >= 0 ? 'pass' : 'fail', value, threshold, margin: m === 0 ? 0 : m };
}

type Quantity = { ok: true; value: number } | { ok: false; reason: string };

/** A threshold, target or tolerance typed with a unit, in the output's unit. */
function readQuantity(text: string, unit: string | null, what: string): Quantity {
  const t = unit === '%' ? text.trim().replace(/\s*%$/, '') : text;
  if (!t.trim()) return { ok: false, reason: `no ${what} given` };
  const parsed = parseInputText({ name: what, label: what, type: 'number', unit }, t);
  if (!parsed.ok)
    return { ok: false, reason: `${what}: ${parsed.message.replace('the field is in', 'the output is in')}` };
  if (typeof parsed.value !== 'number') return { ok: false, reason: `no ${what} given` };
  return { ok: true, value: parsed.value };
}

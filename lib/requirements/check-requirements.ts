import { displayUnit, formatNumber, formatValue } from '@/lib/format/format-output';
import { checkRequirement, type RequirementOutput, type RequirementVerdict } from './check-requirement';
import { COMPARISON_SYMBOL, type RequirementAttrs } from './requirement-attrs';

/** Where an output comes from: the block's name and the output, or why it cannot be read. */
export type OutputLookup = (
  blockId: string,
  output: string,
) => { ok: true; block: string; output: RequirementOutput } | { ok: false; reason: string };

/** One requirement decided, with the texts the editor, the PDF and the compliance table print. */
export interface RequirementCheck {
  requirement: RequirementAttrs;
  verdict: RequirementVerdict;
  /** "Selected repeat orbit · Mean altitude", or the reason the output cannot be read. */
  source: string;
  /** The value at display precision with its unit, "—" when undecided. */
  valueText: string;
  /** "≤ 25 yr", "10.5 h ± 15 min". */
  conditionText: string;
  /** "+1.23 km" inside the limit, "−0.20 km" outside; "" when undecided. */
  marginText: string;
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
/** A number as text with its unit as displayed ("98.2°", "25 yr"). */
const joinUnit = (n: string, unit: string | null) => {
  const u = displayUnit(unit);
  return u === '°' || u === '%' ? `${n}${u}` : u ? `${n} ${u}` : n;
};
/** A threshold as typed; a bare number gets the output's unit so the condition reads on its own. */
const withUnit = (text: string, unit: string | null) => {
  const t = text.trim();
  if (!t) return '?';
  return NUMBER.test(t) ? joinUnit(t, unit) : t;
};

/** The condition of a requirement as printed: "≤ 25 yr", "= 12", "10.5 h ± 15 min". */
export function conditionText(
  req: Pick<RequirementAttrs, 'comparison' | 'threshold' | 'tolerance'>,
  unit: string | null,
): string {
  return req.comparison === 'within'
    ? `${withUnit(req.threshold, unit)} ± ${withUnit(req.tolerance, unit)}`
    : `${COMPARISON_SYMBOL[req.comparison]} ${withUnit(req.threshold, unit)}`;
}

/** Decides one requirement against the outputs `lookup` reads (live evaluations, the editor's results or a frozen revision). */
export function checkRequirementWith(requirement: RequirementAttrs, lookup: OutputLookup): RequirementCheck {
  const found =
    requirement.blockId && requirement.output
      ? lookup(requirement.blockId, requirement.output)
      : { ok: false as const, reason: 'no calc output chosen' };
  if (!found.ok) {
    return {
      requirement,
      verdict: { status: 'undecided', reason: found.reason },
      source: found.reason,
      valueText: '—',
      conditionText: conditionText(requirement, null),
      marginText: '',
    };
  }
  const { field } = found.output;
  const verdict = checkRequirement(requirement, found.output);
  const precision = field.type === 'integer' ? 0 : field.precision;
  const sign =
    verdict.status !== 'undecided' && verdict.margin > 0
      ? '+'
      : verdict.status !== 'undecided' && verdict.margin < 0
        ? '−'
        : '';
  const marginText =
    verdict.status === 'undecided'
      ? ''
      : joinUnit(`${sign}${formatNumber(Math.abs(verdict.margin), precision)}`, field.unit);
  return {
    requirement,
    verdict,
    source: `${found.block} · ${field.label}`,
    valueText: verdict.status === 'undecided' ? '—' : formatValue(verdict.value, field.unit, precision),
    conditionText: conditionText(requirement, field.unit),
    marginText,
  };
}

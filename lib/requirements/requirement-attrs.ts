import { z } from 'zod';

/** The requirement node: what the orbit must achieve, as a comparison of one calc block output with a threshold. */
export const REQUIREMENT = 'requirement';
/** The compliance table node: every requirement of the memo with its value, threshold, margin and verdict. */
export const COMPLIANCE_TABLE = 'complianceTable';

/** `le` ≤, `ge` ≥, `eq` = (at the output's display precision), `within` target ± tolerance. */
export const COMPARISONS = ['le', 'ge', 'eq', 'within'] as const;
export type Comparison = (typeof COMPARISONS)[number];
export const COMPARISON_SYMBOL: Record<Comparison, string> = { le: '≤', ge: '≥', eq: '=', within: '±' };
export const COMPARISON_WORDS: Record<Comparison, string> = {
  le: 'at most',
  ge: 'at least',
  eq: 'equal to',
  within: 'within ± of',
};

/** REQ-ORB-001: upper-case letters and digits in groups joined by hyphens, starting with a letter. */
export const requirementIdSchema = z
  .string()
  .max(40, 'requirement id must have at most 40 characters')
  .regex(
    /^[A-Z][A-Z0-9]*(-[A-Z0-9]+){0,5}$/,
    'requirement id must be upper-case letters and digits in groups joined by hyphens, e.g. REQ-ORB-001',
  );

/** Stored attributes (defaults as the Tiptap node gives them). Threshold and tolerance are text with a unit, read against the output's unit. */
export const requirementAttrsSchema = z.object({
  requirementId: requirementIdSchema,
  text: z.string().max(1000).default(''),
  blockId: z.string().max(40).default(''),
  output: z.string().max(64).default(''),
  comparison: z.enum(COMPARISONS).default('le'),
  threshold: z.string().max(60).default(''),
  tolerance: z.string().max(60).default(''),
});
export type RequirementAttrs = z.infer<typeof requirementAttrsSchema>;

/**
 * The next free id after the highest of the same prefix ("REQ-ORB-007" →
 * "REQ-ORB-008"), for a new or pasted requirement; "REQ-ORB-001" in a memo
 * without requirements.
 */
export function nextRequirementId(taken: Iterable<string>, like = 'REQ-ORB-001'): string {
  const m = /^(.*?)(\d+)$/.exec(like);
  const prefix = m ? m[1] : `${like}-`;
  const width = m ? m[2].length : 3;
  let highest = 0;
  const all = new Set(taken);
  for (const id of all) {
    if (!id.startsWith(prefix)) continue;
    const n = Number(id.slice(prefix.length));
    if (Number.isInteger(n)) highest = Math.max(highest, n);
  }
  let n = highest + 1;
  while (all.has(`${prefix}${String(n).padStart(width, '0')}`)) n++;
  return `${prefix}${String(n).padStart(width, '0')}`;
}

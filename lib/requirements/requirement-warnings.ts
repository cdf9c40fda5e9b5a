import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { checkRequirementWith, type RequirementCheck } from './check-requirements';
import { lookupInEvaluations } from './lookup-outputs';

/** Every requirement of a document checked against its server evaluations, in document order. */
export function checkDocumentRequirements(
  doc: TiptapNode,
  evaluations: ReadonlyMap<string, BlockEvaluation>,
): RequirementCheck[] {
  const lookup = lookupInEvaluations(evaluations);
  return documentIndex(doc).requirements.map((r) => checkRequirementWith(r, lookup));
}

/** One sentence for a requirement that is not met or cannot be decided. */
export function requirementWarning(c: RequirementCheck): string {
  const id = c.requirement.requirementId;
  return c.verdict.status === 'undecided'
    ? `${id} cannot be decided: ${c.verdict.reason}.`
    : `${id} is not met: ${c.source} is ${c.valueText}, required ${c.conditionText} (margin ${c.marginText}).`;
}

/**
 * Warnings for submit and freeze: each requirement not met or undecided.
 * A warning, not a refusal — a memo may well record that the orbit misses a
 * requirement (that is what the reviewer and the customer must see).
 */
export function requirementWarnings(doc: TiptapNode, evaluations: ReadonlyMap<string, BlockEvaluation>): string[] {
  return checkDocumentRequirements(doc, evaluations)
    .filter((c) => c.verdict.status !== 'pass')
    .map(requirementWarning);
}

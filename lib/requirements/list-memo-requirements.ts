import type { Actor } from '@/lib/auth/permissions';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { documentIndex } from '@/lib/documents/model/document-index';
import { loadMemoFor } from '@/lib/memos/load-memo';
import type { RequirementCheck } from './check-requirements';
import { checkDocumentRequirements, requirementWarning } from './requirement-warnings';

export interface RequirementRecord {
  requirementId: string;
  text: string;
  /** 'pass' | 'fail' | 'undecided' */
  status: RequirementCheck['verdict']['status'];
  value: string;
  condition: string;
  margin: string;
  source: string;
  /** The sentence submit and freeze warn with; null when met. */
  warning: string | null;
}

export const toRequirementRecord = (c: RequirementCheck): RequirementRecord => ({
  requirementId: c.requirement.requirementId,
  text: c.requirement.text,
  status: c.verdict.status,
  value: c.valueText,
  condition: c.conditionText,
  margin: c.marginText,
  source: c.source,
  warning: c.verdict.status === 'pass' ? null : requirementWarning(c),
});

/** A memo's requirements checked against its blocks recomputed on the server now (what submit and freeze will warn about). */
export async function listMemoRequirements(
  actor: Actor,
  memoId: number,
): Promise<{ requirements: RequirementRecord[] }> {
  // Staff only (as versions and comparisons): a customer reads the frozen revision's PDF, not numbers recomputed now.
  const { memo } = await loadMemoFor(actor, memoId, 'memo.versions');
  if (documentIndex(memo.content).requirements.length === 0) return { requirements: [] };
  const evaluations = await evaluateDocumentJob(actor.id, memo.content);
  return { requirements: checkDocumentRequirements(memo.content, evaluations).map(toRequirementRecord) };
}

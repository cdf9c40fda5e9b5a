import { isHeavyCalcKind } from '@/lib/calc';
import { blockName } from '@/lib/documents/calc-nodes';
import { evaluateDocument, type BlockEvaluation } from '@/lib/documents/evaluate-document';
import { extractCalcBlocks } from '@/lib/documents/extract-calc-blocks';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { calcCrashed, calcOverBudget } from './calc-over-budget';
import { heavyJobConfig } from './heavy-job-config';
import { runHeavyJob } from './run-heavy-job';

/**
 * Every calc block of a stored document recomputed for a person (see
 * evaluateDocument). A document without heavy blocks is computed here; one
 * with a heavy block goes to the worker pool whole, since its results may
 * feed other blocks, under the per-user limit and the calculation budget.
 */
export async function evaluateDocumentJob(userId: number, doc: TiptapNode): Promise<Map<string, BlockEvaluation>> {
  const heavy = extractCalcBlocks(doc).blocks.filter((b) => isHeavyCalcKind(b.kind));
  if (heavy.length === 0) return evaluateDocument(doc);
  const { calcBudgetSeconds } = heavyJobConfig();
  const subject = `Computing ${heavy.map(blockName).join(', ')}`;
  return runHeavyJob(userId, { type: 'evaluate-document', doc }, {
    budgetSeconds: calcBudgetSeconds,
    overBudget: () => calcOverBudget(subject, heavy.map((b) => b.kind), calcBudgetSeconds),
    crashed: (reason) => calcCrashed(subject, reason),
  });
}

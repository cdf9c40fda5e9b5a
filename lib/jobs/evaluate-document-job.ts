import crypto from 'node:crypto';
import { isHeavyCalcKind } from '@/lib/calc';
import { blockName } from '@/lib/documents/calc-nodes';
import { evaluateDocument, type BlockEvaluation } from '@/lib/documents/evaluate-document';
import { documentIndex } from '@/lib/documents/model/document-index';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { calcCrashed, calcOverBudget } from './calc-over-budget';
import { heavyJobConfig } from './heavy-job-config';
import { runHeavyJob } from './run-heavy-job';

type Evaluations = Map<string, BlockEvaluation>;

/**
 * Evaluations in progress in the pool, by SHA-256 of the document: a memo
 * page and its figures ask for the same document at once, and share one job
 * (one of the person's slots) rather than each taking one. On globalThis,
 * as every route may have its own copy of this module.
 */
const KEY = Symbol.for('nodewright.evaluationsInProgress');
function inProgress(): Map<string, Promise<Evaluations>> {
  const g = globalThis as typeof globalThis & { [KEY]?: Map<string, Promise<Evaluations>> };
  return (g[KEY] ??= new Map());
}

/**
 * Every calc block of a stored document recomputed for a person (see
 * evaluateDocument). A document without heavy blocks is computed here; one
 * with a heavy block goes to the worker pool whole, since its results may
 * feed other blocks, under the per-user limit and the calculation budget.
 */
export async function evaluateDocumentJob(userId: number, doc: TiptapNode): Promise<Evaluations> {
  const heavy = documentIndex(doc).calc.blocks.filter((b) => isHeavyCalcKind(b.kind));
  if (heavy.length === 0) return evaluateDocument(doc);
  const key = crypto.createHash('sha256').update(JSON.stringify(doc)).digest('hex');
  const shared = inProgress().get(key);
  if (shared) return shared;
  const { calcBudgetSeconds } = heavyJobConfig();
  const subject = `Computing ${heavy.map(blockName).join(', ')}`;
  const job = runHeavyJob(
    userId,
    { type: 'evaluate-document', doc },
    {
      budgetSeconds: calcBudgetSeconds,
      overBudget: () =>
        calcOverBudget(
          subject,
          heavy.map((b) => b.kind),
          calcBudgetSeconds,
        ),
      crashed: (reason) => calcCrashed(subject, reason),
    },
  ).finally(() => inProgress().delete(key));
  inProgress().set(key, job);
  return job;
}

import { isHeavyCalcKind, runCalc, type CalcOutcome } from '@/lib/calc';
import { calcCrashed, calcOverBudget } from './calc-over-budget';
import { heavyJobConfig } from './heavy-job-config';
import { rememberCalcOutcome } from './remember-calc-outcome';
import { runHeavyJob } from './run-heavy-job';

/**
 * One calculation for a person: a light kind runs here (microseconds; the
 * same kind and inputs again are answered from rememberCalcOutcome), a
 * heavy kind (`heavy: true` in the registry) in the worker pool under the
 * per-user limit and the calculation time budget.
 */
export async function runCalcJob(userId: number, kind: string, inputs: unknown): Promise<CalcOutcome> {
  if (!isHeavyCalcKind(kind)) return rememberCalcOutcome(kind, inputs, () => runCalc(kind, inputs));
  const { calcBudgetSeconds } = heavyJobConfig();
  const subject = `The ${kind} calculation`;
  return runHeavyJob(
    userId,
    { type: 'calc', kind, inputs },
    {
      budgetSeconds: calcBudgetSeconds,
      overBudget: () => calcOverBudget(subject, [kind], calcBudgetSeconds),
      crashed: (reason) => calcCrashed(subject, reason),
    },
  );
}

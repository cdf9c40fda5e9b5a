import { ApiError } from '@/lib/api/errors';
import { getCalcKind } from '@/lib/calc';

/**
 * The 422 for heavy calculations that ran out of their time budget: names
 * the inputs that set the cost (the kind's `costInputs`) and what to change.
 * `subject` says what was stopped ("The propagation-check calculation",
 * "Computing “Drift check”").
 */
export function calcOverBudget(subject: string, kinds: readonly string[], budgetSeconds: number): ApiError {
  const fields: Record<string, string> = {};
  for (const kind of new Set(kinds)) {
    for (const [input, advice] of Object.entries(getCalcKind(kind)?.costInputs ?? {}))
      fields[input] ??= `try ${advice}`;
  }
  const advice = Object.entries(fields).map(([input, text]) => `${text.replace(/^try /, '')} (${input})`);
  const hint = advice.length > 0 ? `try ${advice.join(' or ')}` : 'reduce the span or resolution of its inputs';
  return new ApiError(
    'unprocessable',
    `${subject} ran longer than ${budgetSeconds} s, the limit for one calculation, and was stopped: ${hint}.`,
    {
      fields: Object.keys(fields).length > 0 ? fields : { calculation: hint },
    },
  );
}

/** The 422 for a calculation whose worker died. */
export function calcCrashed(subject: string, reason: string): ApiError {
  return new ApiError(
    'unprocessable',
    `${subject} failed in its worker (${reason}) and was stopped; nothing else was affected. Check its inputs and try again.`,
    { fields: { calculation: reason } },
  );
}

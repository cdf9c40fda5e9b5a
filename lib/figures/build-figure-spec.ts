import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import { getFigureKind, FIGURE_KINDS } from './figure-kinds';
import { FigureDataError, type FigureOutcome } from './figure-types';

/**
 * The Vega-Lite spec of a figure of `figureKind` bound to one evaluated calc
 * block (from evaluateDocument). Every number in it comes from the engine.
 */
export function buildFigureSpec(figureKind: string, evaluation: BlockEvaluation | undefined): FigureOutcome {
  const definition = getFigureKind(figureKind);
  if (!definition)
    return {
      ok: false,
      error: `unknown figure kind "${figureKind}" (known: ${FIGURE_KINDS.map((k) => k.kind).join(', ')})`,
    };
  if (!evaluation) return { ok: false, error: 'the figure is not bound to a calc block in this memo' };
  if (evaluation.status === 'error')
    return { ok: false, error: `the bound calc block has no result: ${evaluation.error}` };
  const { result } = evaluation;
  if (!definition.sourceCalcKinds.includes(result.kind)) {
    return {
      ok: false,
      error: `a ${definition.title.toLowerCase()} figure needs a ${definition.sourceCalcKinds.join(' or ')} block, not ${result.kind}`,
    };
  }
  try {
    return { ok: true, spec: definition.build(result) };
  } catch (err) {
    if (err instanceof FigureDataError) return { ok: false, error: err.message };
    throw err;
  }
}

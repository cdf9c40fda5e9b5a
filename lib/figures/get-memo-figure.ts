import type { Actor } from '@/lib/auth/permissions';
import { notFound } from '@/lib/api/errors';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { documentIndex } from '@/lib/documents/model/document-index';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { buildFigureSpec } from './build-figure-spec';
import type { FigureSpec } from './figure-types';

export interface MemoFigure {
  figureId: string;
  figureKind: string;
  blockId: string;
  /** "Figure n" by document order. */
  number: number;
  caption: string;
  /** The Vega-Lite spec, or null with the reason when the figure cannot be drawn. */
  spec: FigureSpec | null;
  error?: string;
}

/** One figure of a memo, its spec built on the server from the stored inputs (recomputed now). */
export async function getMemoFigure(actor: Actor, memoId: number, figureId: string): Promise<MemoFigure> {
  const { memo } = await loadMemoFor(actor, memoId, 'memo.view');
  const index = documentIndex(memo.content);
  const figure = index.figures.find((f) => f.figureId === figureId);
  if (!figure) throw notFound(`Figure ${figureId} of memo ${memoId}`);
  const outcome = buildFigureSpec(
    figure.figureKind,
    (await evaluateDocumentJob(actor.id, memo.content)).get(figure.blockId),
  );
  const base = { ...figure, number: index.figureNumbers.get(figureId) ?? 0 };
  return outcome.ok ? { ...base, spec: outcome.spec } : { ...base, spec: null, error: outcome.error };
}

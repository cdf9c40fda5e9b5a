import type { TiptapNode } from '@/lib/memos/memo-schema';
import { extractFigures } from '@/lib/figures/figure-nodes';

/** Figure numbers by document order: the first figure is 1. Keyed by figureId. */
export function numberFigures(doc: TiptapNode): Map<string, number> {
  return new Map(extractFigures(doc).map((f, i) => [f.figureId, i + 1]));
}

import { z } from 'zod';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { blockIdSchema, newBlockId } from '@/lib/documents/calc-nodes';
import { walk } from '@/lib/documents/extract-calc-blocks';

/** The figure node: a figure kind bound to one calc block, with its caption (no data). */
export const FIGURE = 'figure';

export const figureAttrsSchema = z.object({
  figureId: blockIdSchema,
  figureKind: z.string().min(1).max(64),
  blockId: z.string().max(40).default(''),
  caption: z.string().max(500).default(''),
});
export type FigureAttrs = z.infer<typeof figureAttrsSchema>;

/** A new figure id: short, random, URL-safe (same alphabet as block ids, "f" first). */
export const newFigureId = (): string => `f${newBlockId().slice(1)}`;

/** Every well-formed figure of a document in document order (a repeated id is kept once, first wins). */
export function extractFigures(doc: TiptapNode): FigureAttrs[] {
  const out: FigureAttrs[] = [];
  const seen = new Set<string>();
  walk(doc, (node) => {
    if (node.type !== FIGURE) return;
    const parsed = figureAttrsSchema.safeParse(node.attrs ?? {});
    if (parsed.success && !seen.has(parsed.data.figureId)) {
      seen.add(parsed.data.figureId);
      out.push(parsed.data);
    }
  });
  return out;
}

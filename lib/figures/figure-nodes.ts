import { z } from 'zod';
import { blockIdSchema, newBlockId } from '@/lib/documents/calc-nodes';

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

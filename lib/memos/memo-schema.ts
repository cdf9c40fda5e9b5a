import { z } from 'zod';

/** A ProseMirror/Tiptap JSON node as stored in a memo. Node types are checked by the renderers. */
export interface TiptapNode {
  type: string;
  attrs?: Record<string, unknown>;
  content?: TiptapNode[];
  marks?: { type: string; attrs?: Record<string, unknown> }[];
  text?: string;
}
export interface TiptapDoc extends TiptapNode {
  type: 'doc';
  content: TiptapNode[];
}

const markSchema = z.object({ type: z.string().min(1), attrs: z.record(z.string(), z.unknown()).optional() });

export const tiptapNodeSchema: z.ZodType<TiptapNode> = z.lazy(() =>
  z.object({
    type: z.string().min(1).max(64),
    attrs: z.record(z.string(), z.unknown()).optional(),
    content: z.array(tiptapNodeSchema).optional(),
    marks: z.array(markSchema).optional(),
    text: z.string().optional(),
  }),
);

/** Largest stored document we accept, as JSON text (images are stored separately). */
export const MAX_CONTENT_BYTES = 2_000_000;

export const tiptapDocSchema = z
  .object({ type: z.literal('doc'), content: z.array(tiptapNodeSchema) })
  .refine((doc) => JSON.stringify(doc).length <= MAX_CONTENT_BYTES, {
    message: `document is larger than ${MAX_CONTENT_BYTES / 1_000_000} MB`,
  }) as z.ZodType<TiptapDoc>;

export const EMPTY_DOC: TiptapDoc = { type: 'doc', content: [{ type: 'paragraph' }] };

export const documentNumberSchema = z
  .string()
  .trim()
  .min(3, 'document number must have at least 3 characters')
  .max(64, 'document number must have at most 64 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._\-/]*$/, 'document number may use letters, digits and . _ - / only');

export const memoTitleSchema = z.string().trim().min(1, 'title is required').max(300, 'title must have at most 300 characters');

export const createMemoInputSchema = z.strictObject({
  title: memoTitleSchema,
  documentNumber: documentNumberSchema.optional(),
  templateId: z.string().min(1).max(64).optional(),
});
export type CreateMemoInput = z.infer<typeof createMemoInputSchema>;

export const patchMemoInputSchema = z
  .strictObject({
    title: memoTitleSchema.optional(),
    content: tiptapDocSchema.optional(),
    baseVersion: z.number({ error: 'baseVersion is required (the version your change is based on)' }).int().min(1),
  })
  .refine((v) => v.title !== undefined || v.content !== undefined, { message: 'nothing to save: give title or content', path: ['content'] });
export type PatchMemoInput = z.infer<typeof patchMemoInputSchema>;

/** PUT /api/memos/:id/co-authors: the whole list of co-authors, replacing the current one (at most 20). */
export const setCoAuthorsInputSchema = z.strictObject({
  userIds: z
    .array(z.number({ error: 'userIds must list user ids (numbers)' }).int().positive(), { error: 'userIds must list the co-authors’ user ids' })
    .max(20, 'at most 20 co-authors'),
});
export type SetCoAuthorsInput = z.infer<typeof setCoAuthorsInputSchema>;

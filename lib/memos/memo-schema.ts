import { z } from 'zod';

/** A ProseMirror/Tiptap JSON node as stored in a memo (checked at save by lib/documents/validate-memo-content.ts). */
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

/**
 * The content of a save, checked here only for being a JSON object: the
 * full check against the document schema (types, attributes, depth, size)
 * is lib/documents/validate-memo-content.ts, run by the save itself (it needs
 * the memo's attachments) and written so that no nesting can exhaust the
 * stack — a recursive zod schema here would recurse before it.
 */
export const memoContentInputSchema = z.custom<TiptapDoc>(
  (v) => typeof v === 'object' && v !== null && !Array.isArray(v),
  {
    message: 'content must be a document object ({"type": "doc", "content": [...]})',
  },
);

export const EMPTY_DOC: TiptapDoc = { type: 'doc', content: [{ type: 'paragraph' }] };

export const documentNumberSchema = z
  .string()
  .trim()
  .min(3, 'document number must have at least 3 characters')
  .max(64, 'document number must have at most 64 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9._\-/]*$/, 'document number may use letters, digits and . _ - / only');

export const memoTitleSchema = z
  .string()
  .trim()
  .min(1, 'title is required')
  .max(300, 'title must have at most 300 characters');

export const createMemoInputSchema = z.strictObject({
  title: memoTitleSchema,
  documentNumber: documentNumberSchema.optional(),
  templateId: z.string().min(1).max(64).optional(),
});
export type CreateMemoInput = z.infer<typeof createMemoInputSchema>;

export const patchMemoInputSchema = z
  .strictObject({
    title: memoTitleSchema.optional(),
    content: memoContentInputSchema.optional(),
    baseVersion: z.number({ error: 'baseVersion is required (the version your change is based on)' }).int().min(1),
  })
  .refine((v) => v.title !== undefined || v.content !== undefined, {
    message: 'nothing to save: give title or content',
    path: ['content'],
  });
export type PatchMemoInput = z.infer<typeof patchMemoInputSchema>;

/** PUT /api/memos/:id/co-authors: the whole list of co-authors, replacing the current one (at most 20). */
export const setCoAuthorsInputSchema = z.strictObject({
  userIds: z
    .array(z.number({ error: 'userIds must list user ids (numbers)' }).int().positive(), {
      error: 'userIds must list the co-authors’ user ids',
    })
    .max(20, 'at most 20 co-authors'),
});
export type SetCoAuthorsInput = z.infer<typeof setCoAuthorsInputSchema>;

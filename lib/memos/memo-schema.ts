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
    /** Set when the change puts back an older version's text: the history shows the save as a restore of it. */
    restoredFrom: z.number({ error: 'restoredFrom must be a version number' }).int().min(1).optional(),
  })
  .refine((v) => v.title !== undefined || v.content !== undefined, {
    message: 'nothing to save: give title or content',
    path: ['content'],
  });
export type PatchMemoInput = z.infer<typeof patchMemoInputSchema>;

/** GET /api/memos/:id/versions: `all=true` lists every save instead of the editing sessions. */
export const listVersionsQuerySchema = z.object({
  all: z.enum(['true', 'false'], { error: 'all must be true or false' }).default('false'),
});

/** The longest name of a saved version: a line in the history panel, not a change summary. */
export const VERSION_LABEL_MAX = 80;

/** POST /api/memos/:id/versions/:version/label: the name of a saved version ("Checkpoint: before review"). */
export const nameVersionInputSchema = z.strictObject({
  label: z
    .string({ error: 'label is required: the name to give this version' })
    .trim()
    .min(1, 'label must not be empty')
    .max(VERSION_LABEL_MAX, `label must have at most ${VERSION_LABEL_MAX} characters`)
    // A name is one line of text: line breaks and other control characters would not show in the history.
    .regex(/^[^\p{Cc}]*$/u, 'label must be one line of text, without line breaks or control characters'),
});
export type NameVersionInput = z.infer<typeof nameVersionInputSchema>;

/** PUT /api/memos/:id/co-authors: the whole list of co-authors, replacing the current one (at most 20). */
export const setCoAuthorsInputSchema = z.strictObject({
  userIds: z
    .array(z.number({ error: 'userIds must list user ids (numbers)' }).int().positive(), {
      error: 'userIds must list the co-authors’ user ids',
    })
    .max(20, 'at most 20 co-authors'),
});
export type SetCoAuthorsInput = z.infer<typeof setCoAuthorsInputSchema>;

import { z } from 'zod';

/** Longest comment body, in characters. */
export const MAX_COMMENT_CHARS = 4000;
/** Longest quoted passage a thread may anchor to, in characters. */
export const MAX_QUOTE_CHARS = 2000;
/** Context kept on each side of the quote (characters); locate-anchor compares it. */
export const ANCHOR_CONTEXT_CHARS = 40;
const MAX_CONTEXT_CHARS = 200;
/** A quote with its live values written out: each value's text is short (a number and its unit). */
const MAX_SHOWN_CHARS = 2 * MAX_QUOTE_CHARS;

/**
 * Where a thread sits in the memo text: the quoted passage and a little
 * text on each side of it, as plain text (see lib/comments/doc-text.ts).
 * Quoting text rather than storing positions lets a thread find its place
 * again after the memo is edited (lib/comments/locate-anchor.ts).
 */
export const commentAnchorSchema = z.strictObject({
  quote: z
    .string({ error: 'quote is required (the selected text)' })
    .max(MAX_QUOTE_CHARS, `quote must have at most ${MAX_QUOTE_CHARS} characters`)
    .refine((q) => q.trim().length > 0, 'quote must not be empty: select some text first'),
  prefix: z
    .string({ error: 'prefix must be text' })
    .max(MAX_CONTEXT_CHARS, `prefix must have at most ${MAX_CONTEXT_CHARS} characters`),
  suffix: z
    .string({ error: 'suffix must be text' })
    .max(MAX_CONTEXT_CHARS, `suffix must have at most ${MAX_CONTEXT_CHARS} characters`),
  /**
   * The quote as the reader saw it: live values as their displayed text
   * ("98.206°") where `quote` holds one placeholder each. Shown in the
   * thread; the quote, not this, places the thread, so it keeps its place
   * when a value's number changes.
   */
  shown: z
    .string({ error: 'shown must be text' })
    .max(MAX_SHOWN_CHARS, `shown must have at most ${MAX_SHOWN_CHARS} characters`)
    .optional(),
});
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

export const commentBodySchema = z
  .string({ error: 'body is required' })
  .trim()
  .min(1, 'body must not be empty')
  .max(MAX_COMMENT_CHARS, `body must have at most ${MAX_COMMENT_CHARS} characters`);

export const createThreadInputSchema = z.strictObject({
  body: commentBodySchema,
  anchor: commentAnchorSchema,
});
export type CreateThreadInput = z.infer<typeof createThreadInputSchema>;

export const threadActionInputSchema = z.discriminatedUnion(
  'action',
  [
    z.strictObject({ action: z.literal('reply'), body: commentBodySchema }),
    z.strictObject({ action: z.literal('resolve') }),
    z.strictObject({ action: z.literal('reopen') }),
  ],
  { error: 'action must be one of reply, resolve, reopen' },
);
export type ThreadActionInput = z.infer<typeof threadActionInputSchema>;

export const markReadInputSchema = z.strictObject({
  memoId: z
    .number({ error: 'memoId must be a number' })
    .int('memoId must be a whole number')
    .positive('memoId must be positive')
    .optional(),
});
export type MarkReadInput = z.infer<typeof markReadInputSchema>;

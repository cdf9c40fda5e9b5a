import { ANCHOR_CONTEXT_CHARS, MAX_QUOTE_CHARS, type CommentAnchor } from './comment-schema';
import type { TextRange } from './locate-anchor';

export type BuiltAnchor = { ok: true; anchor: CommentAnchor; range: TextRange } | { ok: false; reason: string };

/**
 * The anchor of a new thread on text[from, to): the selected text without
 * white space at its ends, and ANCHOR_CONTEXT_CHARS of text on each side.
 */
export function buildAnchor(text: string, selection: TextRange): BuiltAnchor {
  let from = Math.max(0, Math.min(selection.from, selection.to));
  let to = Math.min(text.length, Math.max(selection.from, selection.to));
  while (from < to && /\s/.test(text[from])) from++;
  while (to > from && /\s/.test(text[to - 1])) to--;
  if (from === to) return { ok: false, reason: 'Select some text to comment on.' };
  if (to - from > MAX_QUOTE_CHARS)
    return {
      ok: false,
      reason: `Select at most ${MAX_QUOTE_CHARS} characters to comment on (this selection has ${to - from}).`,
    };
  return {
    ok: true,
    range: { from, to },
    anchor: {
      quote: text.slice(from, to),
      prefix: text.slice(Math.max(0, from - ANCHOR_CONTEXT_CHARS), from),
      suffix: text.slice(to, to + ANCHOR_CONTEXT_CHARS),
    },
  };
}

import { ANCHOR_CONTEXT_CHARS, type CommentAnchor } from './comment-schema';
import { findApproximateMatches } from './find-approximate-matches';
import { measureSimilarity } from './measure-similarity';

/** A half-open range [from, to) of text offsets. */
export interface TextRange {
  from: number;
  to: number;
}

/** Largest share of the quote's characters that may have been edited for a thread to stay attached. */
export const MAX_QUOTE_EDIT_SHARE = 0.25;
/** Quotes shorter than this must be found exactly: a few edits would leave too little of them. */
export const MIN_FUZZY_QUOTE_CHARS = 8;
/** An edited quote only counts where at least one side of its context still agrees this well. */
export const MIN_CONTEXT_SIMILARITY = 0.5;
/** More exact occurrences than this are not ranked; the first ones are. */
const MAX_CANDIDATES = 500;

function contextSimilarity(text: string, range: TextRange, anchor: CommentAnchor): { before: number; after: number } {
  const beforeLen = Math.max(anchor.prefix.length, ANCHOR_CONTEXT_CHARS);
  const afterLen = Math.max(anchor.suffix.length, ANCHOR_CONTEXT_CHARS);
  // Compare the stored context with as much text as it could have held here:
  // a prefix cut short by the start of the document agrees only with a place
  // that is as near the start.
  const before = text.slice(Math.max(0, range.from - beforeLen), range.from);
  const after = text.slice(range.to, range.to + afterLen);
  return { before: measureSimilarity(anchor.prefix, before), after: measureSimilarity(anchor.suffix, after) };
}

function exactOccurrences(text: string, quote: string): TextRange[] {
  const out: TextRange[] = [];
  for (let i = text.indexOf(quote); i !== -1 && out.length < MAX_CANDIDATES; i = text.indexOf(quote, i + 1))
    out.push({ from: i, to: i + quote.length });
  return out;
}

/**
 * Finds where a thread's quoted passage is in the current text of a memo
 * (lib/comments/doc-text.ts builds that text), so that a thread stays on
 * its passage while the memo is edited around it.
 *
 * 1. The quote occurs exactly once: there.
 * 2. It occurs several times: the occurrence whose surrounding text is
 *    most like the stored prefix and suffix (Levenshtein similarity).
 * 3. It does not occur: the places within MAX_QUOTE_EDIT_SHARE edits of
 *    it (approximate matching, see find-approximate-matches.ts) whose
 *    context still agrees on at least one side; the fewest edits, then the
 *    best context, wins. Quotes under MIN_FUZZY_QUOTE_CHARS must match exactly.
 *
 * The idea of re-attaching by quote plus context follows the W3C Web
 * Annotation Data Model's TextQuoteSelector (exact, prefix, suffix),
 * https://www.w3.org/TR/annotation-model/#text-quote-selector.
 *
 * Returns the text range, or null when the passage is gone (the thread is
 * detached).
 */
export function locateAnchor(text: string, anchor: CommentAnchor): TextRange | null {
  const { quote } = anchor;
  if (quote.length === 0 || text.length === 0) return null;

  const exact = exactOccurrences(text, quote);
  if (exact.length === 1) return exact[0];
  if (exact.length > 1) {
    let best = exact[0];
    let bestScore = -1;
    for (const r of exact) {
      const c = contextSimilarity(text, r, anchor);
      const score = c.before + c.after;
      if (score > bestScore) {
        best = r;
        bestScore = score;
      }
    }
    return best;
  }

  if (quote.length < MIN_FUZZY_QUOTE_CHARS) return null;
  const maxErrors = Math.floor(quote.length * MAX_QUOTE_EDIT_SHARE);
  let found: TextRange | null = null;
  let foundKey: [number, number] = [Infinity, -Infinity];
  for (const match of findApproximateMatches(text, quote, maxErrors)) {
    const c = contextSimilarity(text, match, anchor);
    if (Math.max(c.before, c.after) < MIN_CONTEXT_SIMILARITY) continue;
    const context = c.before + c.after;
    if (match.distance < foundKey[0] || (match.distance === foundKey[0] && context > foundKey[1])) {
      found = { from: match.from, to: match.to };
      foundKey = [match.distance, context];
    }
  }
  return found;
}

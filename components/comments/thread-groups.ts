import type { ThreadRecord } from '@/lib/comments/comment-record';
import type { CommentAnchor } from '@/lib/comments/comment-schema';
import { INLINE_OBJECT } from '@/lib/comments/doc-text';
import type { DocRange } from './comment-highlights';

/** How the panel groups threads: open on a passage, settled, or open but its passage is gone. */
export const THREAD_GROUPS = ['open', 'resolved', 'detached'] as const;
export type ThreadGroup = (typeof THREAD_GROUPS)[number];

export const THREAD_GROUP_LABELS: Record<ThreadGroup, string> = {
  open: 'Open',
  resolved: 'Resolved',
  detached: 'Detached',
};

/**
 * A resolved thread counts as resolved wherever its passage is; an open
 * thread is detached when its passage cannot be found (ranges has null),
 * and open while it is found or not yet looked for.
 */
export function groupOf(thread: ThreadRecord, ranges: ReadonlyMap<number, DocRange | null> | undefined): ThreadGroup {
  if (thread.status === 'resolved') return 'resolved';
  return ranges?.get(thread.id) === null ? 'detached' : 'open';
}

/**
 * A quote for display: as the reader saw it (`shown`, live values as their
 * text) when the thread has it, else with a marker for each live value;
 * long quotes shortened in the middle.
 */
export function displayQuote(anchor: Pick<CommentAnchor, 'quote' | 'shown'>, max = 160): string {
  const q = (anchor.shown ?? anchor.quote).replaceAll(INLINE_OBJECT, '⟨value⟩').replace(/\s*\n\s*/g, ' ⁄ ');
  return q.length <= max ? q : `${q.slice(0, Math.ceil(max * 0.6))} … ${q.slice(q.length - Math.floor(max * 0.3))}`;
}

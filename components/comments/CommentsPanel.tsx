'use client';

import { useEffect, useRef } from 'react';
import type { ThreadRecord } from '@/lib/comments/comment-record';
import type { CommentAnchor } from '@/lib/comments/comment-schema';
import { postJson } from '@/lib/client/fetch-json';
import type { DocRange } from './comment-highlights';
import { CommentBox } from './CommentBox';
import { ThreadCard } from './ThreadCard';
import { displayQuote, groupOf, THREAD_GROUP_LABELS, THREAD_GROUPS, type ThreadGroup } from './thread-groups';

export interface CommentsPanelProps {
  memoId: number;
  threads: ThreadRecord[] | undefined;
  loadError: string | null;
  ranges: ReadonlyMap<number, DocRange | null> | undefined;
  group: ThreadGroup;
  onGroup: (g: ThreadGroup) => void;
  activeId: number | null;
  onActivate: (id: number | null) => void;
  /** Scrolls the memo to a thread's passage. */
  onShowPassage: (id: number) => void;
  /** The passage a new thread is being written for. */
  pending: CommentAnchor | null;
  onPendingDone: (created: ThreadRecord | null) => void;
  onChanged: (thread: ThreadRecord) => void;
  notice: string | null;
  onNotice: (message: string | null) => void;
  canComment: boolean;
  canResolve: boolean;
}

/**
 * The review side panel: threads by group, the thread being written, replies and resolve or reopen.
 * On wide screens it stays in view beside the memo while the memo scrolls (sticky); its thread list scrolls on its own.
 */
export function CommentsPanel(p: CommentsPanelProps) {
  const cards = useRef(new Map<number, HTMLLIElement>());
  const counts = Object.fromEntries(THREAD_GROUPS.map((g) => [g, 0])) as Record<ThreadGroup, number>;
  for (const t of p.threads ?? []) counts[groupOf(t, p.ranges)]++;
  const shown = (p.threads ?? []).filter((t) => groupOf(t, p.ranges) === p.group);

  useEffect(() => {
    if (p.activeId !== null) cards.current.get(p.activeId)?.scrollIntoView({ block: 'nearest' });
  }, [p.activeId, p.group]);

  return (
    <section
      aria-label="Review threads"
      className="text-note lg:sticky lg:top-3 lg:z-10 lg:flex lg:max-h-[calc(100vh-1.5rem)] lg:flex-col lg:bg-paper lg:pb-2"
      data-review-panel
    >
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="label">Review threads</h2>
        {p.threads && <span className="text-micro text-ink-faint">{p.threads.length} in all</span>}
      </div>
      {p.canComment && !p.pending && (
        <p className="mb-2 text-micro text-ink-faint">Select text in the memo, then Comment or Ctrl+Alt+M.</p>
      )}
      {p.notice && (
        <p
          role="status"
          className="mb-2 flex items-start gap-2 rounded-chip border border-ember-500 bg-ember-50 px-2 py-1 text-micro text-ember-700"
        >
          <span className="flex-1">{p.notice}</span>
          <button type="button" className="underline" onClick={() => p.onNotice(null)}>
            Dismiss
          </button>
        </p>
      )}
      {p.pending && (
        <div className="mb-3 rounded-card border border-orbit-500 bg-paper-raised p-2.5 shadow-sheet" data-new-thread>
          <p className="mb-1.5 border-l-2 border-dashed border-orbit-600 pl-2 text-micro italic text-ink-soft">
            “{displayQuote(p.pending)}”
          </p>
          <CommentBox<ThreadRecord>
            label="New thread"
            submitLabel="Post comment"
            placeholder="What should change, and why?"
            autoFocus
            onSubmit={(body) => postJson<ThreadRecord>(`/api/memos/${p.memoId}/comments`, { body, anchor: p.pending })}
            onSent={(t) => p.onPendingDone(t)}
            onCancel={() => p.onPendingDone(null)}
          />
        </div>
      )}
      <div
        role="group"
        aria-label="Show threads"
        className="mb-2 flex rounded-chip border border-rule bg-paper-sunk p-0.5"
      >
        {THREAD_GROUPS.map((g) => (
          <button
            key={g}
            type="button"
            aria-pressed={p.group === g}
            onClick={() => p.onGroup(g)}
            className={`flex-1 rounded-chip px-1.5 py-0.5 text-micro ${p.group === g ? 'bg-paper-raised font-semibold text-ink shadow-sheet' : 'text-ink-soft hover:text-ink'}`}
          >
            {THREAD_GROUP_LABELS[g]} {counts[g]}
          </button>
        ))}
      </div>
      {p.loadError && <p className="text-ember-700">Threads are not available: {p.loadError}</p>}
      {!p.threads && !p.loadError && <p className="text-ink-faint">Loading…</p>}
      {p.threads && shown.length === 0 && (
        <p className="py-2 text-micro text-ink-faint">
          {p.group === 'open'
            ? 'No open threads.'
            : p.group === 'resolved'
              ? 'No resolved threads.'
              : 'Every thread is on its passage.'}
        </p>
      )}
      <ol className="max-h-[60vh] space-y-2 overflow-y-auto pr-0.5 lg:max-h-none lg:min-h-0 lg:flex-1" data-thread-list>
        {shown.map((t) => (
          <ThreadCard
            key={t.id}
            ref={(el) => {
              if (el) cards.current.set(t.id, el);
              else cards.current.delete(t.id);
            }}
            thread={t}
            group={p.group}
            active={p.activeId === t.id}
            canComment={p.canComment}
            canResolve={p.canResolve}
            onActivate={() => p.onActivate(p.activeId === t.id ? null : t.id)}
            onShowPassage={() => p.onShowPassage(t.id)}
            onChanged={p.onChanged}
            onProblem={(m) => p.onNotice(m)}
          />
        ))}
      </ol>
    </section>
  );
}

'use client';

import { forwardRef } from 'react';
import type { ThreadRecord } from '@/lib/comments/comment-record';
import { patchJson } from '@/lib/client/fetch-json';
import { formatDateTime } from '@/lib/format/format-date';
import { CommentBox } from './CommentBox';
import { displayQuote, type ThreadGroup } from './thread-groups';

const GROUP_MARK: Record<ThreadGroup, { glyph: string; text: string; tone: string }> = {
  open: { glyph: '◆', text: 'Open', tone: 'text-orbit-700' },
  resolved: { glyph: '✓', text: 'Resolved', tone: 'text-moss-700' },
  detached: { glyph: '◇', text: 'Detached', tone: 'text-ember-700' },
};

export interface ThreadCardProps {
  thread: ThreadRecord;
  group: ThreadGroup;
  active: boolean;
  canComment: boolean;
  canResolve: boolean;
  onActivate: () => void;
  /** Scrolls the memo back to the thread's passage. */
  onShowPassage: () => void;
  onChanged: (thread: ThreadRecord) => void;
  onProblem: (message: string) => void;
}

/** One thread: its quote, first comment, replies; when active, the reply box and resolve or reopen. */
export const ThreadCard = forwardRef<HTMLLIElement, ThreadCardProps>(function ThreadCard(
  { thread, group, active, canComment, canResolve, onActivate, onShowPassage, onChanged, onProblem },
  ref,
) {
  const mark = GROUP_MARK[group];
  const setStatus = async (action: 'resolve' | 'reopen') => {
    const res = await patchJson<ThreadRecord>(`/api/comments/${thread.id}`, { action });
    if (res.ok) onChanged(res.data);
    else onProblem(res.error);
  };
  return (
    <li
      ref={ref}
      data-thread-id={thread.id}
      data-thread-group={group}
      className={`rounded-card border px-2.5 py-2 ${active ? 'border-orbit-500 bg-paper-raised shadow-sheet' : 'border-rule bg-paper-raised/60'}`}
    >
      <button
        type="button"
        className="block w-full text-left"
        onClick={onActivate}
        aria-expanded={active}
        aria-label={`Thread on “${displayQuote(thread.anchor, 60)}” by ${thread.author.name}`}
      >
        <span className={`flex items-center gap-1 text-micro font-semibold uppercase ${mark.tone}`}>
          <span aria-hidden="true">{mark.glyph}</span>
          {mark.text}
          {group === 'resolved' && thread.resolvedBy && (
            <span className="font-normal normal-case text-ink-faint">by {thread.resolvedBy.name}</span>
          )}
        </span>
        <span
          className={`mt-1 block border-l-2 pl-2 text-micro italic ${group === 'detached' ? 'border-ember-500 text-ember-700' : 'border-orbit-500 text-ink-soft'}`}
        >
          “{displayQuote(thread.anchor)}”
        </span>
        {group === 'detached' && (
          <span className="mt-1 block text-micro text-ember-700">This passage is no longer in the memo.</span>
        )}
      </button>
      <div className="mt-1.5">
        <p className="text-micro text-ink-faint">
          <span className="font-medium text-ink-soft">{thread.author.name}</span> · {formatDateTime(thread.createdAt)}
        </p>
        <p className={`whitespace-pre-wrap break-words text-note ${active ? '' : 'line-clamp-3'}`}>{thread.body}</p>
      </div>
      {thread.replies.length > 0 && !active && (
        <p className="mt-1 text-micro text-ink-faint">
          {thread.replies.length} repl{thread.replies.length === 1 ? 'y' : 'ies'}
        </p>
      )}
      {active && (
        <>
          {group !== 'detached' && (
            <button
              type="button"
              className="mt-1.5 text-micro text-orbit-700 underline"
              onClick={onShowPassage}
              data-show-passage
            >
              <span aria-hidden="true">↖</span> Back to the passage
            </button>
          )}
          {thread.replies.length > 0 && (
            <ol className="mt-2 space-y-1.5 border-l border-rule pl-2" aria-label="Replies">
              {thread.replies.map((r) => (
                <li key={r.id}>
                  <p className="text-micro text-ink-faint">
                    <span className="font-medium text-ink-soft">{r.author.name}</span> · {formatDateTime(r.createdAt)}
                  </p>
                  <p className="whitespace-pre-wrap break-words text-note">{r.body}</p>
                </li>
              ))}
            </ol>
          )}
          {canComment && (
            <div className="mt-2">
              <CommentBox<ThreadRecord>
                label="Reply"
                submitLabel="Reply"
                onSubmit={(body) => patchJson<ThreadRecord>(`/api/comments/${thread.id}`, { action: 'reply', body })}
                onSent={onChanged}
              />
            </div>
          )}
          {canResolve && (
            <div className="mt-2 border-t border-rule pt-2">
              {thread.status === 'open' ? (
                <button type="button" className="btn-quiet py-1" onClick={() => void setStatus('resolve')}>
                  <span aria-hidden="true">✓</span> Resolve thread
                </button>
              ) : (
                <button type="button" className="btn-quiet py-1" onClick={() => void setStatus('reopen')}>
                  Reopen thread
                </button>
              )}
            </div>
          )}
        </>
      )}
    </li>
  );
});

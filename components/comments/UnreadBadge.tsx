'use client';

import { useCallback, useRef, useState } from 'react';
import Link from 'next/link';
import useSWR from 'swr';
import type { NotificationKind } from '@/lib/comments/comment-status';
import type { NotificationRecord, NotificationsRecord } from '@/lib/comments/comment-record';
import { postJson, swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { formatDateTime } from '@/lib/format/format-date';
import { useDismiss } from '@/components/shell/use-dismiss';

/** How often the header asks whether something new happened in a thread or a review. */
const REFRESH_MS = 30_000;

const VERB: Record<NotificationKind, string> = {
  comment: 'started a thread on',
  reply: 'replied on',
  resolved: 'resolved a thread on',
  reopened: 'reopened a thread on',
  submitted: 'submitted for your review',
  'changes-requested': 'requested changes to',
  approved: 'gave the last approval of',
  frozen: 'froze',
  released: 'released to customers',
};

/** Where a note leads: its thread, or the memo page for a review transition. */
const hrefOf = (n: NotificationRecord) =>
  n.threadId !== null ? `/memos/${n.memo.id}?thread=${n.threadId}` : `/memos/${n.memo.id}`;

/** The header's review-notes button: unread count, and the latest notes (threads and review transitions) with links. */
export function UnreadBadge() {
  const { data, mutate } = useSWR<NotificationsRecord>(swrKeys.notifications(), swrFetcher, {
    refreshInterval: REFRESH_MS,
  });
  const [open, setOpen] = useState(false);
  const ref = useRef<HTMLDivElement>(null);
  const close = useCallback(() => setOpen(false), []);
  const unread = data?.unreadCount ?? 0;

  useDismiss(ref, open, close);

  const markAll = async () => {
    const r = await postJson<{ unreadCount: number }>(swrKeys.notificationsRead(), {});
    if (r.ok) void mutate();
  };

  return (
    <div className="relative" ref={ref}>
      <button
        type="button"
        className="btn-quiet"
        aria-haspopup="true"
        aria-expanded={open}
        // The name holds the visible words and count in order (WCAG 2.1 SC 2.5.3, label in name).
        aria-label={unread > 0 ? `Review notes ${unread} unread` : 'Review notes, none unread'}
        data-unread={unread}
        onClick={() => setOpen((o) => !o)}
      >
        Review notes{' '}
        {unread > 0 && (
          <span className="min-w-5 rounded-chip bg-orbit-600 px-1.5 text-center text-micro font-semibold text-white">
            {unread}
          </span>
        )}
      </button>
      {open && (
        <div
          className="absolute right-0 z-20 mt-1 w-80 sheet p-2 text-note"
          role="region"
          aria-label="Latest review notes"
        >
          <div className="mb-1 flex items-center justify-between px-1">
            <span className="label mb-0">Latest</span>
            <Link href="/settings/notifications" className="text-micro text-orbit-600" onClick={() => setOpen(false)}>
              E-mail settings
            </Link>
            {unread > 0 && (
              <button
                type="button"
                className="text-micro text-orbit-600 hover:underline"
                onClick={() => void markAll()}
              >
                Mark all read
              </button>
            )}
          </div>
          {!data && <p className="px-1 py-2 text-ink-faint">Loading…</p>}
          {data && data.items.length === 0 && (
            <p className="px-1 py-2 text-ink-faint">
              Nothing yet. Threads and review steps of your memos show up here.
            </p>
          )}
          <ul className="max-h-96 space-y-0.5 overflow-y-auto">
            {data?.items.map((n) => (
              <li key={n.id}>
                <Link
                  href={hrefOf(n)}
                  className={`block rounded-chip px-1.5 py-1 text-ink no-underline hover:bg-paper-sunk hover:no-underline ${n.read ? '' : 'border-l-2 border-orbit-600 bg-orbit-50'}`}
                  onClick={() => setOpen(false)}
                >
                  <span className="block">
                    <span className="font-medium">{n.actor.name}</span> {VERB[n.kind]}{' '}
                    <span className="font-mono text-micro">{n.memo.documentNumber}</span>
                    {n.revisionLetter && <> as revision {n.revisionLetter}</>}
                  </span>
                  <span className="block truncate text-micro text-ink-soft">{n.excerpt}</span>
                  <span className="block text-micro text-ink-faint">{formatDateTime(n.createdAt)}</span>
                </Link>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}

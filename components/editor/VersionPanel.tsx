'use client';

import Link from 'next/link';
import { useEffect, useRef, useState } from 'react';
import useSWR from 'swr';
import type { MemoVersionSummary } from '@/lib/memos/memo-record';
import { swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { formatDateTime, formatTimeSpan } from '@/lib/format/format-date';
import { NameVersionDialog } from './NameVersionDialog';

/**
 * The memo's history in editing sessions (lib/memos/coalesce-memo-versions.ts): each entry is the last
 * version of a run of saves, with its name if it has one, how many saves and when. View any read-only;
 * see what a session changed; restore one as a new version; name the current version. `restoreCurrent`
 * offers the current version too: when the memo's stored content could not be loaded, its saved copy may still be good.
 */
export function VersionPanel({
  memoId,
  currentVersion,
  canRestore,
  canName,
  restoreCurrent = false,
  onRestore,
}: {
  memoId: number;
  currentVersion: number;
  canRestore: boolean;
  canName: boolean;
  restoreCurrent?: boolean;
  onRestore: (v: number) => void;
}) {
  const { data, error, isLoading, mutate } = useSWR<{ versions: MemoVersionSummary[] }>(
    swrKeys.memoVersions(memoId),
    swrFetcher,
  );
  const [naming, setNaming] = useState<{ versionNumber: number; label: string } | null>(null);
  // The dialog leaves the page when it closes, taking focus with it: give it back to the control that opened it.
  const opener = useRef<HTMLButtonElement | null>(null);
  useEffect(() => {
    if (!naming) opener.current?.focus();
  }, [naming]);
  return (
    <aside aria-label="Version history" className="text-note">
      <h2 className="label">Saved versions</h2>
      {isLoading && <p className="text-ink-faint">Loading…</p>}
      {error && <p className="text-ember-700">Version history is not available: {error.message}</p>}
      <ol className="space-y-1">
        {data?.versions.map((v) => {
          const current = v.versionNumber === currentVersion;
          return (
            <li
              key={v.versionNumber}
              data-version-entry={v.versionNumber}
              className={`rounded-chip px-2 py-1 ${current ? 'bg-orbit-50' : ''}`}
            >
              {v.label && <span className="block font-semibold text-ink">{v.label}</span>}
              <div className="flex items-baseline justify-between gap-2">
                <span>
                  <span className="font-medium">
                    {v.saveCount > 1 ? `v${v.firstVersionNumber}–v${v.versionNumber}` : `v${v.versionNumber}`}
                  </span>{' '}
                  · {v.author.name}
                </span>
                {current && <span className="text-micro uppercase text-orbit-700">current</span>}
              </div>
              <span className="block text-micro text-ink-soft">
                {v.saveCount > 1
                  ? `${v.saveCount} saves, ${formatTimeSpan(v.startedAt, v.createdAt)}`
                  : formatDateTime(v.createdAt)}
                {v.restoredFrom !== null && ` · restored from v${v.restoredFrom}`}
              </span>
              <span className="flex flex-wrap gap-x-3 text-micro">
                <Link href={`/memos/${memoId}?version=${v.versionNumber}`}>View</Link>
                {v.firstVersionNumber > 1 && (
                  <Link href={`/memos/${memoId}/compare?from=v${v.firstVersionNumber - 1}&to=v${v.versionNumber}`}>
                    Changes
                  </Link>
                )}
                {canRestore && (!current || restoreCurrent) && (
                  <button
                    type="button"
                    className="text-orbit-600 underline-offset-2 hover:underline"
                    onClick={() => onRestore(v.versionNumber)}
                  >
                    Restore as new version
                  </button>
                )}
                {canName && (current || v.label) && (
                  <button
                    type="button"
                    className="text-orbit-600 underline-offset-2 hover:underline"
                    onClick={(e) => {
                      opener.current = e.currentTarget;
                      setNaming({ versionNumber: v.versionNumber, label: v.label ?? '' });
                    }}
                  >
                    {v.label ? 'Rename' : 'Name this version'}
                  </button>
                )}
              </span>
            </li>
          );
        })}
      </ol>
      {naming && (
        <NameVersionDialog
          memoId={memoId}
          versionNumber={naming.versionNumber}
          initialLabel={naming.label}
          onClose={() => setNaming(null)}
          onNamed={() => {
            setNaming(null);
            void mutate();
          }}
        />
      )}
    </aside>
  );
}

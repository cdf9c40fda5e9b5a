'use client';

import Link from 'next/link';
import useSWR from 'swr';
import type { MemoVersionSummary } from '@/lib/memos/memo-record';
import { swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { formatDateTime } from '@/lib/format/format-date';

/**
 * Every saved version: who and when; view any read-only; restore one as a new version. `restoreCurrent`
 * offers the current version too: when the memo's stored content could not be loaded, its saved copy may still be good.
 */
export function VersionPanel({
  memoId,
  currentVersion,
  canRestore,
  restoreCurrent = false,
  onRestore,
}: {
  memoId: number;
  currentVersion: number;
  canRestore: boolean;
  restoreCurrent?: boolean;
  onRestore: (v: number) => void;
}) {
  const { data, error, isLoading } = useSWR<{ versions: MemoVersionSummary[] }>(
    swrKeys.memoVersions(memoId),
    swrFetcher,
  );
  return (
    <aside aria-label="Version history" className="text-note">
      <h2 className="label">Saved versions</h2>
      {isLoading && <p className="text-ink-faint">Loading…</p>}
      {error && <p className="text-ember-700">Version history is not available: {error.message}</p>}
      <ol className="space-y-1">
        {data?.versions.map((v) => (
          <li
            key={v.versionNumber}
            className={`rounded-chip px-2 py-1 ${v.versionNumber === currentVersion ? 'bg-orbit-50' : ''}`}
          >
            <div className="flex items-baseline justify-between gap-2">
              <span>
                <span className="font-medium">v{v.versionNumber}</span> · {v.author.name}
              </span>
              {v.versionNumber === currentVersion && (
                <span className="text-micro uppercase text-orbit-700">current</span>
              )}
            </div>
            <span className="block text-micro text-ink-faint">{formatDateTime(v.createdAt)}</span>
            <span className="flex gap-3 text-micro">
              <Link href={`/memos/${memoId}?version=${v.versionNumber}`}>View</Link>
              {canRestore && (v.versionNumber !== currentVersion || restoreCurrent) && (
                <button
                  type="button"
                  className="text-orbit-600 underline-offset-2 hover:underline"
                  onClick={() => onRestore(v.versionNumber)}
                >
                  Restore as new version
                </button>
              )}
            </span>
          </li>
        ))}
      </ol>
    </aside>
  );
}

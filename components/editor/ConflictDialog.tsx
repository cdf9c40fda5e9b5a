'use client';

import { useEffect, useRef } from 'react';
import { formatDateTime } from '@/lib/format/format-date';

export interface ConflictInfo {
  currentVersion: number;
  savedBy: string | null;
  savedAt: string | null;
  message: string;
}

/** Someone saved since this editor's version: choose whose text goes on. Nothing typed is lost either way. */
export function ConflictDialog({
  info,
  onLoadTheirs,
  onKeepMine,
}: {
  info: ConflictInfo;
  onLoadTheirs: () => void;
  onKeepMine: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
    return () => d?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      className="sheet m-auto max-w-lg p-6 backdrop:bg-ink/30"
      aria-labelledby="conflict-title"
      onCancel={(e) => e.preventDefault()}
    >
      <h2 id="conflict-title" className="text-lead font-semibold">
        This memo was saved by someone else
      </h2>
      <p className="mt-2 text-body">
        {info.savedBy ?? 'Another user'} saved version {info.currentVersion}
        {info.savedAt ? ` on ${formatDateTime(info.savedAt)}` : ''} while you were editing. Your changes have not been
        written over theirs, and are kept in this browser.
      </p>
      <div className="mt-5 flex flex-wrap justify-end gap-2">
        <button type="button" className="btn-quiet" onClick={onLoadTheirs}>
          Load their version
        </button>
        <button type="button" className="btn-primary" onClick={onKeepMine} autoFocus>
          Keep mine as version {info.currentVersion + 1}
        </button>
      </div>
      <p className="mt-3 text-micro text-ink-faint">Either way, every saved version stays in the version history.</p>
    </dialog>
  );
}

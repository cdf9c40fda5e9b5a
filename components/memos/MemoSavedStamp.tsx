'use client';

import { useEffect, useState } from 'react';
import { formatDateTime } from '@/lib/format/format-date';

const MEMO_SAVED_EVENT = 'nodewright:memo-saved';
type MemoSaved = { memoId: number; version: number; updatedAt: string };

/** Told by the editor after each accepted save (autosave included), so the page header shows what is stored. */
export function announceMemoSaved(saved: MemoSaved): void {
  window.dispatchEvent(new CustomEvent<MemoSaved>(MEMO_SAVED_EVENT, { detail: saved }));
}

/** The header's "Version N" or "Updated …", rendered by the server and kept current by the editor's saves. */
export function MemoSavedStamp({ memoId, version, updatedAt, part }: MemoSaved & { part: 'version' | 'updated' }) {
  const [saved, setSaved] = useState({ version, updatedAt });
  useEffect(() => {
    const onSaved = (e: Event) => {
      const detail = (e as CustomEvent<MemoSaved>).detail;
      if (detail.memoId === memoId) setSaved({ version: detail.version, updatedAt: detail.updatedAt });
    };
    window.addEventListener(MEMO_SAVED_EVENT, onSaved);
    return () => window.removeEventListener(MEMO_SAVED_EVENT, onSaved);
  }, [memoId]);
  return part === 'version' ? (
    <span data-header-version={saved.version}>Version {saved.version}</span>
  ) : (
    <span data-header-updated={saved.updatedAt}>Updated {formatDateTime(saved.updatedAt)}</span>
  );
}

import type { TiptapDoc } from '@/lib/memos/memo-schema';

/**
 * What was typed is kept in the browser until the server confirms it, so a
 * crash, a reload or a lost connection never loses work.
 */
export interface LocalBackup {
  memoId: number;
  baseVersion: number;
  title: string;
  content: TiptapDoc;
  keptAt: string;
}

const key = (memoId: number, slot: 'pending' | 'set-aside') => `nodewright:memo:${memoId}:${slot}`;

export function readBackup(memoId: number, slot: 'pending' | 'set-aside' = 'pending'): LocalBackup | null {
  try {
    const raw = window.localStorage.getItem(key(memoId, slot));
    if (!raw) return null;
    const b = JSON.parse(raw) as LocalBackup;
    return b && b.memoId === memoId && b.content?.type === 'doc' ? b : null;
  } catch {
    return null;
  }
}

export function writeBackup(b: LocalBackup, slot: 'pending' | 'set-aside' = 'pending'): void {
  try {
    window.localStorage.setItem(key(b.memoId, slot), JSON.stringify(b));
  } catch {
    /* storage full or disabled: the autosave still runs */
  }
}

export function clearBackup(memoId: number, slot: 'pending' | 'set-aside' = 'pending'): void {
  try {
    window.localStorage.removeItem(key(memoId, slot));
  } catch {
    /* ignore */
  }
}

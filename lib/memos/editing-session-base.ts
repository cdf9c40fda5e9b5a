import type { MemoVersionSummary } from './memo-record';

/**
 * The version a comparison starts from to show what the current editing
 * session changed: the last version before the session (the previous
 * history entry), or the session's first version when it began the memo.
 * `history` is newest first, as listMemoVersions answers.
 */
export function editingSessionBase(history: readonly MemoVersionSummary[], currentVersion: number): number {
  const session = history.find((h) => h.firstVersionNumber <= currentVersion && currentVersion <= h.versionNumber);
  const first = session?.firstVersionNumber ?? currentVersion;
  return Math.max(1, first - 1);
}

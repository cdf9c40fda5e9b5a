import { describe, expect, it } from 'vitest';
import { editingSessionBase } from '@/lib/memos/editing-session-base';
import type { MemoVersionSummary } from '@/lib/memos/memo-record';

/**
 * Where the comparison starts for someone who has not reviewed the memo: the
 * history entry before the current editing session (README, "Compare"),
 * checked on hand-written histories.
 */
const entry = (first: number, last: number): MemoVersionSummary => ({
  versionNumber: last,
  firstVersionNumber: first,
  saveCount: last - first + 1,
  title: 't',
  author: { id: 1, name: 'Ilse' },
  startedAt: '2026-12-02T09:00:00Z',
  createdAt: '2026-12-02T09:10:00Z',
  label: null,
  restoredFrom: null,
});

describe('editingSessionBase', () => {
  it('the last version before the current session', () => {
    expect(editingSessionBase([entry(10, 11), entry(1, 9)], 11)).toBe(9);
  });
  it('the first version when the session began the memo, and version 1 for a new memo', () => {
    expect(editingSessionBase([entry(1, 9)], 9)).toBe(1);
    expect(editingSessionBase([entry(1, 1)], 1)).toBe(1);
  });
  it('the version before the current one when the history does not know the current version yet', () => {
    expect(editingSessionBase([entry(1, 9)], 12)).toBe(11);
  });
});

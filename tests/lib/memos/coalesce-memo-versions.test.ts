import { describe, expect, it } from 'vitest';
import {
  coalesceMemoVersions,
  EDITING_SESSION_GAP_MS,
  type SessionBreaks,
  type StoredSave,
} from '@/lib/memos/coalesce-memo-versions';

/**
 * The grouping rule of the version history, checked against hand-written
 * timelines (the rule as README states it, "Saved versions"): saves by one
 * person with pauses of at most ten minutes form one entry; a pause over
 * ten minutes, another author, a named version, a workflow step or a
 * restore starts a new one. Times are exact; the gap boundary is tested at
 * the limit and one millisecond past it.
 */

const T0 = Date.parse('2026-12-02T09:00:00Z');
const MIN = 60_000;
const save = (
  versionNumber: number,
  minutes: number,
  authorId = 1,
  restoredFrom: number | null = null,
): StoredSave => ({
  versionNumber,
  authorId,
  createdAt: new Date(T0 + minutes * MIN),
  restoredFrom,
});
const none: SessionBreaks = { labels: new Map(), transitionsAt: new Set() };
/** Entries as [last, first, count], newest first. */
const shape = (saves: StoredSave[], breaks: SessionBreaks = none) =>
  coalesceMemoVersions(saves, breaks).map((s) => [s.versionNumber, s.firstVersionNumber, s.saveCount]);

describe('coalesceMemoVersions', () => {
  it('the gap is ten minutes', () => {
    expect(EDITING_SESSION_GAP_MS).toBe(600_000);
  });

  it('29 autosaves in 16 minutes by one person are one entry, with its first version, count and span', () => {
    const saves = Array.from({ length: 29 }, (_, i) => save(i + 1, (i * 16) / 28));
    const [only, ...rest] = coalesceMemoVersions(saves, none);
    expect(rest).toEqual([]);
    expect(only).toMatchObject({ versionNumber: 29, firstVersionNumber: 1, saveCount: 29, authorId: 1, label: null });
    expect(only.startedAt.toISOString()).toBe('2026-12-02T09:00:00.000Z');
    expect(only.createdAt.toISOString()).toBe('2026-12-02T09:16:00.000Z');
  });

  it('a pause of exactly ten minutes continues the session; one millisecond more starts a new one', () => {
    expect(shape([save(1, 0), save(2, 10)])).toEqual([[2, 1, 2]]);
    const late: StoredSave = { ...save(2, 10), createdAt: new Date(T0 + 10 * MIN + 1) };
    expect(shape([save(1, 0), late])).toEqual([
      [2, 2, 1],
      [1, 1, 1],
    ]);
  });

  it('the gap is measured from the previous save, not from the session start', () => {
    // 0, 9, 18, 27 minutes: each pause is 9 minutes, the session spans 27.
    expect(shape([save(1, 0), save(2, 9), save(3, 18), save(4, 27)])).toEqual([[4, 1, 4]]);
  });

  it('another author starts a new session, and so does the first author coming back', () => {
    expect(shape([save(1, 0, 1), save(2, 1, 1), save(3, 2, 2), save(4, 3, 1)])).toEqual([
      [4, 4, 1],
      [3, 3, 1],
      [2, 1, 2],
    ]);
  });

  it('a named version ends its session and keeps its name; the next save starts a new one', () => {
    const saves = [save(1, 0), save(2, 1), save(3, 2), save(4, 3), save(5, 4)];
    const entries = coalesceMemoVersions(saves, {
      labels: new Map([[3, 'Checkpoint: before review']]),
      transitionsAt: new Set(),
    });
    expect(entries.map((e) => [e.versionNumber, e.firstVersionNumber, e.saveCount, e.label])).toEqual([
      [5, 4, 2, null],
      [3, 1, 3, 'Checkpoint: before review'],
    ]);
  });

  it('a workflow step at a version ends the session there', () => {
    expect(shape([save(1, 0), save(2, 1), save(3, 2)], { labels: new Map(), transitionsAt: new Set([2]) })).toEqual([
      [3, 3, 1],
      [2, 1, 2],
    ]);
  });

  it('a restore stands alone: it neither joins the session before it nor takes in the saves after it', () => {
    const entries = coalesceMemoVersions([save(1, 0), save(2, 1), save(3, 2, 1, 1), save(4, 3), save(5, 4)], none);
    expect(entries.map((e) => [e.versionNumber, e.firstVersionNumber, e.saveCount, e.restoredFrom])).toEqual([
      [5, 4, 2, null],
      [3, 3, 1, 1],
      [2, 1, 2, null],
    ]);
  });

  it('orders saves by version number whatever order they come in, and answers newest first', () => {
    expect(shape([save(3, 2), save(1, 0), save(2, 1)])).toEqual([[3, 1, 3]]);
    expect(shape([])).toEqual([]);
  });
});

import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { AuditEvent, MemoVersion, MemoVersionLabel } from '@/models';
import { saveMemo } from '@/lib/memos/save-memo';
import { getMemoVersion, listMemoVersions } from '@/lib/memos/list-memo-versions';
import { nameMemoVersion } from '@/lib/memos/name-memo-version';
import { transitionMemo } from '@/lib/workflow/transition-memo';
import { ApiError, toErrorBody } from '@/lib/api/errors';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/**
 * Named versions and the grouped history over real saves (SQLite here,
 * PostgreSQL under test:postgres): what the history lists after autosaves,
 * a name, a submit and a request for changes, and a restore; that naming
 * writes beside the versions (never into them), is audited, refuses bad
 * names with the field named, and that two namings at once both land.
 * Save times are set with a fake clock (Date only), exact to the minute.
 */

const doc = (text: string): TiptapDoc => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});
const T0 = Date.parse('2026-12-02T09:00:00Z');
const at = (minutes: number) => vi.setSystemTime(new Date(T0 + minutes * 60_000));
const SIGNING_PASSWORD = 'correct-horse-battery';

let ilse: Actor;
let noor: Actor;
let other: Actor;
let reviewer: Actor;

beforeAll(async () => {
  await freshDatabase();
  ilse = await makeUser('analyst', 'Ilse');
  noor = await makeUser('analyst', 'Noor');
  other = await makeUser('analyst', 'Otto');
  reviewer = await makeUser('reviewer', 'Rhea');
});
afterEach(() => {
  vi.useRealTimers();
});

async function saveAt(actor: Actor, memoId: number, minutes: number, text: string, restoredFrom?: number) {
  at(minutes);
  const current = await MemoVersion.max<number, MemoVersion>('versionNumber', { where: { memoId } });
  return saveMemo(actor, memoId, { content: doc(text), baseVersion: current, restoredFrom });
}

describe('the grouped history', () => {
  it('lists editing sessions: a name, a workflow step, another author and a restore each end one', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    at(0);
    const memo = await makeMemo(ilse, { coAuthors: [noor] }); // v1
    for (let i = 1; i <= 5; i++) await saveAt(ilse, memo.id, i, `draft ${i}`); // v2..v6, one a minute
    await nameMemoVersion(ilse, memo.id, 6, { label: 'Checkpoint: before review' });
    await saveAt(ilse, memo.id, 7, 'after the checkpoint'); // v7
    await saveAt(ilse, memo.id, 8, 'ready'); // v8
    at(9);
    await transitionMemo(
      ilse,
      memo.id,
      { action: 'submit', reviewerIds: [reviewer.id] },
      { clientAddress: '127.0.0.1' },
    );
    await transitionMemo(
      reviewer,
      memo.id,
      { action: 'request-changes', note: 'Say which altitude convention.', password: SIGNING_PASSWORD },
      { clientAddress: '127.0.0.1' },
    );
    await saveAt(ilse, memo.id, 11, 'convention named'); // v9: after the step, a new session
    await saveAt(noor, memo.id, 12, 'Noor adds a table'); // v10: another author
    await saveAt(ilse, memo.id, 13, 'draft 1', 2); // v11: a restore of v2
    await saveAt(ilse, memo.id, 14, 'and on from there'); // v12
    await saveAt(ilse, memo.id, 40, 'after lunch'); // v13: 26 minutes later

    const history = await listMemoVersions(ilse, memo.id);
    expect(
      history.map((h) => [h.versionNumber, h.firstVersionNumber, h.saveCount, h.author.name, h.label, h.restoredFrom]),
    ).toEqual([
      [13, 13, 1, 'Ilse', null, null],
      [12, 12, 1, 'Ilse', null, null],
      [11, 11, 1, 'Ilse', null, 2],
      [10, 10, 1, 'Noor', null, null],
      [9, 9, 1, 'Ilse', null, null],
      [8, 7, 2, 'Ilse', null, null],
      [6, 1, 6, 'Ilse', 'Checkpoint: before review', null],
    ]);
    const checkpoint = history.at(-1)!;
    expect(checkpoint.startedAt).toBe('2026-12-02T09:00:00.000Z');
    expect(checkpoint.createdAt).toBe('2026-12-02T09:05:00.000Z');
    // Every save is still there, and listed one by one when asked.
    const every = await listMemoVersions(ilse, memo.id, { everySave: true });
    expect(every.map((v) => v.versionNumber)).toEqual([13, 12, 11, 10, 9, 8, 7, 6, 5, 4, 3, 2, 1]);
    expect(every.find((v) => v.versionNumber === 6)?.label).toBe('Checkpoint: before review');
    expect((await getMemoVersion(ilse, memo.id, 6)).label).toBe('Checkpoint: before review');
    // The restore is its own audit event, in words.
    const restore = await AuditEvent.findOne({ where: { memoId: memo.id, action: 'memo.restore' } });
    expect(restore?.details).toEqual({ version: 11, restoredFrom: 2 });
  });

  it('refuses a restore of a version the memo does not have (400 naming restoredFrom), saving nothing', async () => {
    const memo = await makeMemo(ilse);
    const refused = await saveMemo(ilse, memo.id, { content: doc('x'), baseVersion: 1, restoredFrom: 7 }).catch(
      (e: unknown) => e,
    );
    expect(refused).toBeInstanceOf(ApiError);
    expect((refused as ApiError).status).toBe(400);
    expect((refused as ApiError).fields).toEqual({ restoredFrom: 'no saved version 7' });
    expect(await MemoVersion.count({ where: { memoId: memo.id } })).toBe(1);
  });
});

describe('nameMemoVersion', () => {
  it('adds a name beside the version, audited; a newer name replaces it; the version row is untouched', async () => {
    const memo = await makeMemo(ilse);
    const before = (await MemoVersion.findOne({ where: { memoId: memo.id, versionNumber: 1 } }))!.toJSON();
    const named = await nameMemoVersion(ilse, memo.id, 1, { label: '  Checkpoint: first layout  ' });
    expect(named).toMatchObject({ versionNumber: 1, label: 'Checkpoint: first layout', namedBy: { name: 'Ilse' } });
    await nameMemoVersion(ilse, memo.id, 1, { label: 'Checkpoint: layout agreed' });
    expect((await listMemoVersions(ilse, memo.id))[0].label).toBe('Checkpoint: layout agreed');
    expect(await MemoVersionLabel.count({ where: { memoId: memo.id } })).toBe(2);
    expect((await MemoVersion.findOne({ where: { memoId: memo.id, versionNumber: 1 } }))!.toJSON()).toEqual(before);
    const events = await AuditEvent.findAll({
      where: { memoId: memo.id, action: 'memo.name-version' },
      order: [['id', 'ASC']],
    });
    expect(events.map((e) => e.details)).toEqual([
      { version: 1, label: 'Checkpoint: first layout' },
      { version: 1, label: 'Checkpoint: layout agreed' },
    ]);
  });

  it('refuses an empty, a too long and a multi-line name with 400 naming label', async () => {
    const memo = await makeMemo(ilse);
    for (const [label, says] of [
      ['   ', 'label must not be empty'],
      ['x'.repeat(81), 'label must have at most 80 characters'],
      ['two\nlines', 'label must be one line of text, without line breaks or control characters'],
    ]) {
      // As the API answers it: the one translator turns the refusal into the error body.
      const { status, body } = toErrorBody(await nameMemoVersion(ilse, memo.id, 1, { label }).catch((e: unknown) => e));
      expect(status, JSON.stringify(label)).toBe(400);
      expect(body.fields).toEqual({ label: says });
    }
    expect(await nameMemoVersion(ilse, memo.id, 1, { label: 'x'.repeat(80) })).toMatchObject({ label: 'x'.repeat(80) });
  });

  it('answers 404 for a version the memo does not have and 403 for an analyst who is not an author', async () => {
    const memo = await makeMemo(ilse);
    const missing = await nameMemoVersion(ilse, memo.id, 9, { label: 'Nine' }).catch((e: unknown) => e);
    expect((missing as ApiError).status).toBe(404);
    const stranger = await nameMemoVersion(other, memo.id, 1, { label: 'Mine now' }).catch((e: unknown) => e);
    expect((stranger as ApiError).status).toBe(403);
    expect(await MemoVersionLabel.count({ where: { memoId: memo.id } })).toBe(0);
  });

  it('two authors naming the same version at once both succeed; the later row is the name', async () => {
    const memo = await makeMemo(ilse, { coAuthors: [noor] });
    const results = await Promise.all([
      nameMemoVersion(ilse, memo.id, 1, { label: 'Ilse’s name' }),
      nameMemoVersion(noor, memo.id, 1, { label: 'Noor’s name' }),
    ]);
    expect(results.map((r) => r.label).sort()).toEqual(['Ilse’s name', 'Noor’s name']);
    const last = await MemoVersionLabel.findOne({ where: { memoId: memo.id }, order: [['id', 'DESC']] });
    expect((await listMemoVersions(ilse, memo.id))[0].label).toBe(last?.label);
  });
});

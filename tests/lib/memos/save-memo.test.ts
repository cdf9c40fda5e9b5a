import { beforeAll, describe, expect, it } from 'vitest';
import { Comment, Memo, MemoVersion } from '@/models';
import { saveMemo } from '@/lib/memos/save-memo';
import { getMemo } from '@/lib/memos/get-memo';
import { getMemoVersion, listMemoVersions } from '@/lib/memos/list-memo-versions';
import { ApiError } from '@/lib/api/errors';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

const doc = (text: string): TiptapDoc => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});

let ilse: Actor;
let noor: Actor;
let reviewer: Actor;

beforeAll(async () => {
  await freshDatabase();
  ilse = await makeUser('analyst', 'Ilse');
  noor = await makeUser('analyst', 'Noor');
  reviewer = await makeUser('reviewer');
});

describe('saveMemo (optimistic concurrency)', () => {
  it('writes the memo and a new MemoVersion together', async () => {
    const memo = await makeMemo(ilse);
    const saved = await saveMemo(ilse, memo.id, { content: doc('first text'), baseVersion: 1 });
    expect(saved.version).toBe(2);
    const versions = await listMemoVersions(ilse, memo.id, { everySave: true });
    expect(versions.map((v) => v.versionNumber)).toEqual([2, 1]);
    expect((await getMemoVersion(ilse, memo.id, 2)).content).toEqual(doc('first text'));
  });

  it('replies with what a read right after the save shows (built without reading back), for owner and co-author', async () => {
    const memo = await makeMemo(ilse, { coAuthors: [noor], reviewers: [reviewer] });
    await Comment.create({ memoId: memo.id, authorId: reviewer.id, body: 'Which LTAN?', status: 'open' });
    const byOwner = await saveMemo(ilse, memo.id, { title: 'Renamed', content: doc('owner text'), baseVersion: 1 });
    expect(byOwner).toEqual(await getMemo(ilse, memo.id));
    expect(byOwner.openThreads).toBe(1);
    const byCoAuthor = await saveMemo(noor, memo.id, { content: doc('co-author text'), baseVersion: 2 });
    expect(byCoAuthor).toEqual(await getMemo(noor, memo.id));
    const titleOnly = await saveMemo(noor, memo.id, { title: 'Title only', baseVersion: 3 });
    expect(titleOnly).toEqual(await getMemo(noor, memo.id));
    expect(titleOnly.content).toEqual(doc('co-author text'));
    expect(Date.parse(titleOnly.updatedAt)).toBeGreaterThanOrEqual(Date.parse(byCoAuthor.updatedAt));
  });

  it('refuses a stale save with 409 and the current version, and loses nothing', async () => {
    const memo = await makeMemo(ilse, { coAuthors: [noor] });
    await saveMemo(ilse, memo.id, { content: doc('Ilse wrote this'), baseVersion: 1 });
    let caught: unknown;
    try {
      await saveMemo(noor, memo.id, { content: doc('Noor, based on v1'), baseVersion: 1 });
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(ApiError);
    const e = caught as ApiError;
    expect(e.status).toBe(409);
    expect(e.details).toMatchObject({ currentVersion: 2, savedBy: { name: 'Ilse' } });
    expect(e.message).toMatch(/version 2 by Ilse/);
    // Ilse's text is intact, and no version 3 was written.
    const row = await Memo.findByPk(memo.id);
    expect(row!.content).toEqual(doc('Ilse wrote this'));
    expect(await MemoVersion.count({ where: { memoId: memo.id } })).toBe(2);
    // Noor re-applies on top of the current version: accepted as version 3.
    const again = await saveMemo(noor, memo.id, { content: doc('Noor, on top of v2'), baseVersion: 2 });
    expect(again.version).toBe(3);
  });

  it('refuses edits by a reviewer (403) and validation errors name the field (400)', async () => {
    const memo = await makeMemo(ilse, { reviewers: [reviewer] });
    await expect(saveMemo(reviewer, memo.id, { content: doc('x'), baseVersion: 1 })).rejects.toMatchObject({
      status: 403,
    });
    await expect(saveMemo(ilse, memo.id, { baseVersion: 1 } as never)).rejects.toMatchObject({ name: 'ZodError' });
  });

  it('refuses edits by an analyst who is neither owner nor co-author (403); a co-author may', async () => {
    const memo = await makeMemo(ilse);
    await expect(saveMemo(noor, memo.id, { content: doc('not mine'), baseVersion: 1 })).rejects.toMatchObject({
      status: 403,
      message: expect.stringMatching(/owner and its co-authors/),
    });
    expect((await Memo.findByPk(memo.id))!.version).toBe(1);
    const shared = await makeMemo(ilse, { coAuthors: [noor] });
    expect((await saveMemo(noor, shared.id, { content: doc('ours'), baseVersion: 1 })).version).toBe(2);
  });

  it('refuses edits once the memo has left draft (409 with the reason)', async () => {
    const memo = await makeMemo(ilse);
    await Memo.update({ status: 'frozen' }, { where: { id: memo.id } });
    await expect(saveMemo(ilse, memo.id, { content: doc('late'), baseVersion: 1 })).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/frozen/),
    });
  });

  it('two concurrent saves on the same base: exactly one wins', async () => {
    const memo = await makeMemo(ilse, { coAuthors: [noor] });
    const results = await Promise.allSettled([
      saveMemo(ilse, memo.id, { content: doc('A'), baseVersion: 1 }),
      saveMemo(noor, memo.id, { content: doc('B'), baseVersion: 1 }),
    ]);
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    const rejected = results.find((r) => r.status === 'rejected') as PromiseRejectedResult;
    expect(rejected.reason).toMatchObject({ status: 409 });
    expect(await MemoVersion.count({ where: { memoId: memo.id } })).toBe(2);
  });
});

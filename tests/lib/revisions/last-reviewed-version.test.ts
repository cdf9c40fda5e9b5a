import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Comment, Memo, MemoVersion } from '@/models';
import { lastReviewedVersion } from '@/lib/revisions/last-reviewed-version';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';
import type { Actor } from '@/lib/auth/permissions';

/**
 * Which version a reviewer last looked at, from the records: the version
 * their latest verdict names, or the version current when they last
 * commented — whichever happened later. Rows are written with explicit
 * times, a minute apart, so that the order does not depend on timing.
 */
let analyst: Actor;
let reviewer: Actor;
let memoId: number;
// Saved versions cannot be updated (baselines refuse UPDATE), so version 1 keeps its creation time: the rest come after it.
const base = Math.ceil(Date.now() / 60_000) * 60_000 + 60_000;
const t = (minute: number) => new Date(base + minute * 60_000);

async function addVersion(versionNumber: number, minute: number) {
  await MemoVersion.create({
    memoId,
    versionNumber,
    title: 'T',
    content: { type: 'doc', content: [] } as never,
    authorId: analyst.id,
    createdAt: t(minute),
  } as never);
}

beforeAll(async () => {
  await freshDatabase();
  analyst = await makeUser('analyst');
  reviewer = await makeUser('reviewer');
  memoId = (await makeMemo(analyst, { reviewers: [reviewer] })).id;
  await addVersion(2, 10);
  await addVersion(3, 20);
  await addVersion(4, 30);
  await Memo.update({ version: 4 }, { where: { id: memoId } });
});

describe('lastReviewedVersion', () => {
  it('is null for a reviewer who has neither commented nor decided', async () => {
    expect(await lastReviewedVersion(reviewer.id, memoId)).toBeNull();
  });

  it('is the version current when the reviewer last commented', async () => {
    await Comment.create({
      memoId,
      authorId: reviewer.id,
      parentId: null,
      body: 'Why 175 revolutions?',
      anchor: { quote: 'x', prefix: '', suffix: '' },
      status: 'open',
      createdAt: t(15),
    } as never);
    expect(await lastReviewedVersion(reviewer.id, memoId)).toEqual({
      versionNumber: 2,
      basis: 'comment',
      at: t(15).toISOString(),
    });
    // Another person's comment does not count.
    await Comment.create({
      memoId,
      authorId: analyst.id,
      parentId: null,
      body: 'Answered.',
      anchor: { quote: 'x', prefix: '', suffix: '' },
      status: 'open',
      createdAt: t(35),
    } as never);
    expect((await lastReviewedVersion(reviewer.id, memoId))?.versionNumber).toBe(2);
  });

  it('is the version a later verdict names, and a later comment wins over an older verdict', async () => {
    await AuditEvent.create({
      at: t(25),
      actorId: reviewer.id,
      actorEmail: reviewer.email,
      action: 'memo.request-changes',
      memoId,
      revisionLetter: null,
      details: { version: 3, round: 1 },
    });
    expect(await lastReviewedVersion(reviewer.id, memoId)).toEqual({
      versionNumber: 3,
      basis: 'decision',
      at: t(25).toISOString(),
    });
    await Comment.create({
      memoId,
      authorId: reviewer.id,
      parentId: null,
      body: 'And the drag margin?',
      anchor: { quote: 'y', prefix: '', suffix: '' },
      status: 'open',
      createdAt: t(31),
    } as never);
    expect(await lastReviewedVersion(reviewer.id, memoId)).toEqual({
      versionNumber: 4,
      basis: 'comment',
      at: t(31).toISOString(),
    });
  });
});

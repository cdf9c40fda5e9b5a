/**
 * lib/memos/get-memo.ts reads a memo for GET /api/memos/:id in two plain
 * queries (read-memo-view.ts). Checked against the model lookups every other
 * memo route makes (loadMemoFor + toMemoDetail): the same detail for each
 * person, exactly, and the same refusals (404 worded as for an unknown id).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { Comment, Delivery, Release } from '@/models';
import { getMemo } from '@/lib/memos/get-memo';
import { loadMemoFor, toMemoDetail } from '@/lib/memos/load-memo';
import { NOT_SHARED_OR_MISSING, type Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeFrozenRevision, makeMemo, makeUser } from '../../support/factories';

async function throughModels(actor: Actor, memoId: number) {
  const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.view');
  return toMemoDetail(actor, memo, facts);
}

let owner: Actor;
let coAuthor: Actor;
let otherAnalyst: Actor;
let reviewerA: Actor;
let reviewerB: Actor;
let unassignedReviewer: Actor;
let cm: Actor;
let customer: Actor;
let otherCustomer: Actor;

beforeAll(async () => {
  await freshDatabase();
  owner = await makeUser('analyst', 'Ilse Varga');
  coAuthor = await makeUser('analyst', 'Noor Haddad');
  otherAnalyst = await makeUser('analyst');
  reviewerA = await makeUser('reviewer', 'Tobias Quenby');
  reviewerB = await makeUser('reviewer');
  unassignedReviewer = await makeUser('reviewer');
  cm = await makeUser('config-manager');
  customer = await makeUser('customer');
  otherCustomer = await makeUser('customer');
});

describe('getMemo', () => {
  it('shows each person the same detail as the model lookups: people, order, open threads, allowed actions', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewerB, reviewerA], coAuthors: [coAuthor] });
    const open = await Comment.create({ memoId: memo.id, authorId: reviewerA.id, body: 'Why 98.2°?', status: 'open' });
    await Comment.create({ memoId: memo.id, authorId: owner.id, parentId: open.id, body: 'See §3.', status: 'open' });
    await Comment.create({ memoId: memo.id, authorId: reviewerB.id, body: 'Settled.', status: 'resolved' });
    await Comment.create({ memoId: memo.id, authorId: reviewerB.id, body: 'And drag?', status: 'open' });
    for (const actor of [owner, coAuthor, otherAnalyst, reviewerA, cm]) {
      const detail = await getMemo(actor, memo.id);
      expect(detail).toEqual(await throughModels(actor, memo.id));
    }
    const detail = await getMemo(owner, memo.id);
    expect(detail.openThreads).toBe(2);
    // Assigned B first, A second: listed by person, as before.
    expect(detail.reviewers.map((r) => r.id)).toEqual([reviewerA.id, reviewerB.id]);
    expect(detail.coAuthors).toEqual([{ id: coAuthor.id, name: 'Noor Haddad' }]);
    expect(detail.owner).toEqual({ id: owner.id, name: 'Ilse Varga' });
    expect(detail.createdAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
  });

  it('answers an unknown id and a memo not shared with the person alike (404)', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewerA] });
    const refusal = { status: 404, message: NOT_SHARED_OR_MISSING };
    await expect(getMemo(unassignedReviewer, memo.id)).rejects.toMatchObject(refusal);
    await expect(getMemo(owner, 987654)).rejects.toMatchObject(refusal);
    await expect(getMemo(customer, memo.id)).rejects.toMatchObject(refusal);
  });

  it('shows a frozen memo to the customers its latest revision was released to, and to no other', async () => {
    const memo = await makeMemo(owner);
    const revision = await makeFrozenRevision(memo.id, cm);
    const release = await Release.create({
      memoId: memo.id,
      revisionId: revision.id,
      coverNote: 'For the Northmere Basin Authority.',
      releasedBy: cm.id,
      releasedAt: new Date(),
    });
    await Delivery.create({
      releaseId: release.id,
      memoId: memo.id,
      revisionId: revision.id,
      recipientId: customer.id,
      recipientEmail: customer.email,
      status: 'delivered',
    });
    expect(await getMemo(customer, memo.id)).toEqual(await throughModels(customer, memo.id));
    expect((await getMemo(customer, memo.id)).status).toBe('frozen');
    await expect(getMemo(otherCustomer, memo.id)).rejects.toMatchObject({ status: 404 });
  });
});

import { beforeAll, describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';
import { Memo, Notification } from '@/models';
import { ApiError } from '@/lib/api/errors';
import { decideMemo, type Actor } from '@/lib/auth/permissions';
import type { MemoSummary } from '@/lib/memos/memo-record';
import { createThread } from '@/lib/comments/create-thread';
import { replyToThread } from '@/lib/comments/reply-to-thread';
import { changeThreadStatus } from '@/lib/comments/change-thread-status';
import { listThreads } from '@/lib/comments/list-threads';
import { countOpenThreads } from '@/lib/comments/count-open-threads';
import { listNotifications } from '@/lib/comments/list-notifications';
import { markNotificationsRead } from '@/lib/comments/mark-notifications-read';
import { listMemos } from '@/lib/memos/list-memos';
import { getMemo } from '@/lib/memos/get-memo';
import { setCoAuthors } from '@/lib/memos/set-co-authors';

/**
 * Review threads against a real (temporary) database: who may start,
 * reply, resolve and reopen (README, "Roles": analysts write and settle,
 * assigned reviewers comment), and who is told.
 */

const anchor = { quote: 'the 12-day cycle of 175 revolutions', prefix: 'the design adopts ', suffix: '.' };

async function refusal(p: Promise<unknown>): Promise<{ status: number; message: string }> {
  try {
    await p;
  } catch (err) {
    if (err instanceof ApiError) return { status: err.status, message: err.message };
    if (err instanceof ZodError)
      return { status: 400, message: err.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ') };
    throw err;
  }
  throw new Error('expected a refusal');
}

const unreadOf = async (a: Actor) => (await listNotifications(a)).unreadCount;

let ilse: Actor; // analyst, owner
let wren: Actor; // second analyst
let tobias: Actor; // assigned reviewer
let moira: Actor; // reviewer not assigned
let ruth: Actor; // configuration manager
let samir: Actor; // customer
let memo: MemoSummary;
let other: MemoSummary;

beforeAll(async () => {
  await freshDatabase();
  ilse = await makeUser('analyst', 'Ilse Marrow');
  wren = await makeUser('analyst', 'Wren Talbot');
  tobias = await makeUser('reviewer', 'Tobias Quenby');
  moira = await makeUser('reviewer', 'Moira Fenn');
  ruth = await makeUser('config-manager', 'Ruth Okafor-Lind');
  samir = await makeUser('customer', 'Samir Dunmore');
  memo = await makeMemo(ilse, { title: 'TERNLIGHT-1 orbit design rationale', reviewers: [tobias] });
  other = await makeMemo(ilse, { title: 'TERNLIGHT-1 maintenance plan', reviewers: [tobias] });
});

describe('permission decisions for threads, by role', () => {
  const facts = { ownerId: 1, coAuthorIds: [], status: 'in-review' as const, reviewerIds: [3], releasedToUserIds: [] };
  const who = (id: number, role: Actor['role']): Actor => ({ id, role, name: role, email: `${role}@x.example` });
  it('reply (memo.comment): analysts and the assigned reviewer; resolve (memo.resolve): analysts only, each refusal says why', () => {
    expect(decideMemo(who(1, 'analyst'), 'memo.comment', facts).allowed).toBe(true);
    expect(decideMemo(who(3, 'reviewer'), 'memo.comment', facts).allowed).toBe(true);
    expect(decideMemo(who(1, 'analyst'), 'memo.resolve', facts).allowed).toBe(true);
    expect(decideMemo(who(3, 'reviewer'), 'memo.resolve', facts)).toEqual({
      allowed: false,
      status: 403,
      reason: 'Only the memo’s authors resolve or reopen threads; reviewers may reply.',
    });
    expect(decideMemo(who(4, 'reviewer'), 'memo.comment', facts)).toEqual({
      allowed: false,
      status: 404,
      reason: 'Not found, or not shared with you.',
    });
    expect(decideMemo(who(5, 'config-manager'), 'memo.resolve', facts)).toEqual({
      allowed: false,
      status: 403,
      reason: 'Only the memo’s authors resolve or reopen threads.',
    });
    expect(decideMemo(who(1, 'analyst'), 'memo.resolve', { ...facts, status: 'frozen' })).toEqual({
      allowed: false,
      status: 409,
      reason: 'The memo is frozen; its threads can no longer change.',
    });
  });
});

describe('threads and notifications', () => {
  let threadId = 0;

  it('the assigned reviewer starts a thread; the owner is told, the writer is not', async () => {
    const t = await createThread(tobias, memo.id, {
      body: 'Why 175 revolutions rather than the 13-day option?',
      anchor,
    });
    threadId = t.id;
    expect(t).toMatchObject({
      memoId: memo.id,
      status: 'open',
      anchor,
      body: 'Why 175 revolutions rather than the 13-day option?',
      author: { id: tobias.id, name: 'Tobias Quenby' },
      replies: [],
      resolvedBy: null,
    });
    expect(await unreadOf(ilse)).toBe(1);
    expect(await unreadOf(tobias)).toBe(0);
    expect(await unreadOf(wren)).toBe(0);
    const n = await listNotifications(ilse);
    expect(n.items[0]).toMatchObject({
      kind: 'comment',
      threadId,
      commentId: threadId,
      actor: { name: 'Tobias Quenby' },
      memo: { id: memo.id, title: 'TERNLIGHT-1 orbit design rationale' },
      read: false,
    });
  });

  it('refuses a customer and an unassigned reviewer (404, as for an unknown memo), a configuration manager (403), and bad input (field named)', async () => {
    // A memo the caller may not see answers exactly like an unknown one (404).
    expect(await refusal(createThread(samir, memo.id, { body: 'x', anchor }))).toEqual({
      status: 404,
      message: 'Not found, or not shared with you.',
    });
    expect(await refusal(createThread(moira, memo.id, { body: 'x', anchor }))).toEqual({
      status: 404,
      message: 'Not found, or not shared with you.',
    });
    expect(await refusal(createThread(ruth, memo.id, { body: 'x', anchor }))).toEqual({
      status: 403,
      message: 'Only analysts and assigned reviewers comment.',
    });
    expect((await refusal(createThread(tobias, memo.id, { body: '   ', anchor }))).message).toBe(
      'body: body must not be empty',
    );
    expect((await refusal(createThread(tobias, memo.id, { body: 'x'.repeat(4001), anchor }))).message).toBe(
      'body: body must have at most 4000 characters',
    );
    expect(
      (await refusal(createThread(tobias, memo.id, { body: 'ok', anchor: { ...anchor, quote: '' } }))).message,
    ).toBe('anchor.quote: quote must not be empty: select some text first');
    expect(await refusal(createThread(tobias, 999_999, { body: 'ok', anchor }))).toEqual({
      status: 404,
      message: 'Not found, or not shared with you.',
    });
  });

  it('a reply by the owner tells the reviewer; a reply by a second analyst tells the owner and the reviewer', async () => {
    await markNotificationsRead(ilse, {});
    const t = await replyToThread(ilse, threadId, 'The 13-day cycle leaves a 12 km gap at the equator.');
    expect(t.replies.map((r) => [r.author.name, r.body])).toEqual([
      ['Ilse Marrow', 'The 13-day cycle leaves a 12 km gap at the equator.'],
    ]);
    expect(await unreadOf(tobias)).toBe(1);
    expect(await unreadOf(ilse)).toBe(0);
    // Replying to a reply lands in the same thread.
    const again = await replyToThread(wren, t.replies[0].id, 'Agreed; see section 3.1.');
    expect(again.id).toBe(threadId);
    expect(again.replies).toHaveLength(2);
    expect(await unreadOf(tobias)).toBe(2);
    expect(await unreadOf(ilse)).toBe(1);
    expect((await listNotifications(tobias)).items.map((n) => [n.kind, n.actor.name, n.excerpt])).toEqual([
      ['reply', 'Wren Talbot', 'Agreed; see section 3.1.'],
      ['reply', 'Ilse Marrow', 'The 13-day cycle leaves a 12 km gap at the equator.'],
    ]);
  });

  it('the reviewer cannot resolve (403 naming why); the analyst resolves, which tells the thread; twice is a 409', async () => {
    expect(await refusal(changeThreadStatus(tobias, threadId, 'resolved'))).toEqual({
      status: 403,
      message: 'Only the memo’s authors resolve or reopen threads; reviewers may reply.',
    });
    await markNotificationsRead(tobias, {});
    await markNotificationsRead(wren, {});
    const t = await changeThreadStatus(ilse, threadId, 'resolved');
    expect(t.status).toBe('resolved');
    expect(t.resolvedBy).toEqual({ id: ilse.id, name: 'Ilse Marrow' });
    expect(t.resolvedAt).not.toBeNull();
    expect(await unreadOf(tobias)).toBe(1);
    expect(await unreadOf(wren)).toBe(1);
    expect((await listNotifications(tobias)).items[0].kind).toBe('resolved');
    expect(await refusal(changeThreadStatus(ilse, threadId, 'resolved'))).toEqual({
      status: 409,
      message: 'This thread is already resolved.',
    });
  });

  it('an analyst who is not an author may not reopen; once the owner adds them as co-author they may, and reopening tells the thread', async () => {
    expect(await refusal(changeThreadStatus(wren, threadId, 'open'))).toEqual({
      status: 403,
      message: 'Only the memo’s owner and its co-authors resolve or reopen threads; other analysts may reply.',
    });
    expect(await setCoAuthors(ilse, memo.id, { userIds: [wren.id] })).toEqual({
      coAuthors: [{ id: wren.id, name: 'Wren Talbot' }],
    });
    const t = await changeThreadStatus(wren, threadId, 'open');
    expect(t).toMatchObject({ status: 'open', resolvedBy: null, resolvedAt: null });
    expect((await listNotifications(tobias)).items[0]).toMatchObject({
      kind: 'reopened',
      actor: { name: 'Wren Talbot' },
    });
    expect(await refusal(changeThreadStatus(wren, threadId, 'open'))).toEqual({
      status: 409,
      message: 'This thread is already open.',
    });
  });

  it('counts open threads per memo in one grouped query, shown in the memo list and detail', async () => {
    const second = await createThread(tobias, memo.id, {
      body: 'Is the 240 km swath the imager’s full swath?',
      anchor: { quote: '240 km swath', prefix: 'With the ', suffix: ' the sidelap' },
    });
    await createThread(tobias, other.id, {
      body: 'Which solar activity?',
      anchor: { quote: 'moderate solar activity', prefix: 'at ', suffix: '' },
    });
    await changeThreadStatus(ilse, second.id, 'resolved');
    expect(await countOpenThreads([memo.id, other.id, 999_999])).toEqual(
      new Map([
        [memo.id, 1],
        [other.id, 1],
      ]),
    );
    await changeThreadStatus(ilse, threadId, 'resolved');
    expect(await countOpenThreads([memo.id, other.id])).toEqual(new Map([[other.id, 1]]));
    const list = await listMemos(ilse);
    expect(Object.fromEntries(list.map((m) => [m.title, m.openThreads]))).toEqual({
      'TERNLIGHT-1 orbit design rationale': 0,
      'TERNLIGHT-1 maintenance plan': 1,
    });
    expect((await getMemo(tobias, other.id)).openThreads).toBe(1);
    const threads = await listThreads(ruth, memo.id);
    expect(threads.map((t) => [t.anchor.quote, t.status, t.replies.length])).toEqual([
      ['the 12-day cycle of 175 revolutions', 'resolved', 2],
      ['240 km swath', 'resolved', 0],
    ]);
    expect(await refusal(listThreads(samir, memo.id))).toEqual({
      status: 404,
      message: 'Not found, or not shared with you.',
    });
  });

  it('marks read per memo or all, and nobody is told about a frozen memo because nobody may write there', async () => {
    await markNotificationsRead(ilse, {});
    await createThread(tobias, memo.id, {
      body: 'One more on drag.',
      anchor: { quote: 'moderate solar activity', prefix: '', suffix: '' },
    });
    await createThread(tobias, other.id, {
      body: 'And one here.',
      anchor: { quote: 'maintenance', prefix: '', suffix: '' },
    });
    expect(await unreadOf(ilse)).toBe(2);
    expect(await markNotificationsRead(ilse, { memoId: memo.id })).toEqual({ marked: 1, unreadCount: 1 });
    expect(await markNotificationsRead(ilse, {})).toEqual({ marked: 1, unreadCount: 0 });

    await Memo.update({ status: 'frozen' }, { where: { id: other.id } });
    const before = await Notification.count();
    expect(await refusal(createThread(tobias, other.id, { body: 'late', anchor }))).toEqual({
      status: 409,
      message: 'The memo is frozen; reopen it as a new draft to discuss changes.',
    });
    const [open] = await listThreads(ilse, other.id);
    expect(await refusal(replyToThread(ilse, open.id, 'late'))).toMatchObject({ status: 409 });
    expect(await refusal(changeThreadStatus(ilse, open.id, 'resolved'))).toEqual({
      status: 409,
      message: 'The memo is frozen; its threads can no longer change.',
    });
    expect(await Notification.count()).toBe(before);
  });
});

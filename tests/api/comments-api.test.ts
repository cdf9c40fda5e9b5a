import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { DEMO_MEMO } from '@/lib/demo/demo-memo';
import type { Role } from '@/lib/auth/roles';
import type { NotificationsRecord, ThreadRecord } from '@/lib/comments/comment-record';
import type { MemoSummary } from '@/lib/memos/memo-record';

/** Review threads over HTTP against the real server, signed in as the demo people. */

const person = (role: Role) => DEMO_USERS.find((u) => u.role === role)!;

async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(person(role).email, DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

type ErrorBody = { error: string; code: string; fields?: Record<string, string> };
const json = (body: unknown) => ({ method: 'POST', body: JSON.stringify(body) });
const patch = (body: unknown) => ({ method: 'PATCH', body: JSON.stringify(body) });

const anchor = {
  quote: 'the design adopts the 12-day cycle of 175 revolutions',
  prefix: ' with at most 16 days are listed first; ',
  suffix: '.\nCoverage\nWith the 240 km swath the sid',
};

let analyst: HttpSession;
let reviewer: HttpSession;
let customer: HttpSession;
let configManager: HttpSession;
let memoId: number;
let openBefore: number;

beforeAll(async () => {
  [analyst, reviewer, customer, configManager] = await Promise.all([
    as('analyst'),
    as('reviewer'),
    as('customer'),
    as('config-manager'),
  ]);
  const list = await analyst.json<{ memos: MemoSummary[] }>('/api/memos');
  const demo = list.body.memos.find((m) => m.documentNumber === DEMO_MEMO.documentNumber)!;
  memoId = demo.id;
  openBefore = demo.openThreads;
  // Start from nothing unread, whatever other test files did on this server.
  for (const s of [analyst, reviewer]) expect((await s.json('/api/notifications/read', json({}))).status).toBe(200);
});

describe('comments API over HTTP', () => {
  let thread: ThreadRecord;

  it('401 without a session', async () => {
    const anon = new HttpSession(inject('baseUrl'));
    expect((await anon.json(`/api/memos/${memoId}/comments`)).status).toBe(401);
    expect((await anon.json('/api/notifications')).status).toBe(401);
  });

  it('400 with field messages for bad input, never a 500', async () => {
    const empty = await reviewer.json<ErrorBody>(
      `/api/memos/${memoId}/comments`,
      json({ body: '  ', anchor: { quote: '', prefix: '', suffix: '' } }),
    );
    expect(empty.status).toBe(400);
    expect(empty.body.fields).toEqual({
      body: 'body must not be empty',
      'anchor.quote': 'quote must not be empty: select some text first',
    });
    const long = await reviewer.json<ErrorBody>(
      `/api/memos/${memoId}/comments`,
      json({ body: 'x'.repeat(4001), anchor }),
    );
    expect(long.body.fields).toEqual({ body: 'body must have at most 4000 characters' });
    const noAnchor = await reviewer.json<ErrorBody>(`/api/memos/${memoId}/comments`, json({ body: 'Where?' }));
    expect(noAnchor.status).toBe(400);
    expect(Object.keys(noAnchor.body.fields ?? {})).toEqual(['anchor']);
    const notJson = await reviewer.json<ErrorBody>(`/api/memos/${memoId}/comments`, { method: 'POST', body: '{body' });
    expect(notJson.status).toBe(400);
    expect(notJson.body.error).toMatch(/not valid JSON/);
    const badAction = await reviewer.json<ErrorBody>('/api/comments/1', patch({ action: 'fly' }));
    expect(badAction.status).toBe(400);
    expect(badAction.body.fields).toEqual({ action: 'action must be one of reply, resolve, reopen' });
    expect((await reviewer.json<ErrorBody>('/api/comments/abc', patch({ action: 'resolve' }))).status).toBe(400);
    const badRead = await analyst.json<ErrorBody>('/api/notifications/read', json({ memoId: 'demo' }));
    expect(badRead.status).toBe(400);
    expect(badRead.body.fields).toEqual({ memoId: 'memoId must be a number' });
  });

  it('the assigned reviewer starts a thread (201); a customer may not (404, as for an unknown memo)', async () => {
    const created = await reviewer.json<ThreadRecord>(
      `/api/memos/${memoId}/comments`,
      json({ body: 'Why 175 revolutions rather than the 13-day cycle?', anchor }),
    );
    expect(created.status).toBe(201);
    thread = created.body;
    expect(thread).toMatchObject({
      memoId,
      status: 'open',
      anchor,
      body: 'Why 175 revolutions rather than the 13-day cycle?',
      author: { name: person('reviewer').name },
      replies: [],
      resolvedBy: null,
      resolvedAt: null,
    });
    const refused = await customer.json<ErrorBody>(`/api/memos/${memoId}/comments`, json({ body: 'May I?', anchor }));
    expect(refused.status).toBe(404);
    expect(refused.body.error).toBe('Not found, or not shared with you.');
    expect((await customer.json(`/api/memos/${memoId}/comments`)).status).toBe(404);
    const cm = await configManager.json<ErrorBody>(`/api/memos/${memoId}/comments`, json({ body: 'May I?', anchor }));
    expect(cm.status).toBe(403);
    expect(cm.body.error).toBe('Only analysts and assigned reviewers comment.');
  });

  it('the analyst has one unread notification, and the memo list counts the open thread', async () => {
    const n = await analyst.json<NotificationsRecord>('/api/notifications');
    expect(n.status).toBe(200);
    expect(n.body.unreadCount).toBe(1);
    expect(n.body.items[0]).toMatchObject({
      kind: 'comment',
      threadId: thread.id,
      read: false,
      actor: { name: person('reviewer').name },
      memo: { id: memoId, documentNumber: DEMO_MEMO.documentNumber },
    });
    expect((await reviewer.json<NotificationsRecord>('/api/notifications')).body.unreadCount).toBe(0);
    const list = await analyst.json<{ memos: MemoSummary[] }>('/api/memos');
    expect(list.body.memos.find((m) => m.id === memoId)!.openThreads).toBe(openBefore + 1);
  });

  it('the analyst replies; the reviewer is told; the thread lists the reply with its author', async () => {
    const replied = await analyst.json<ThreadRecord>(
      `/api/comments/${thread.id}`,
      patch({ action: 'reply', body: 'The 13-day cycle leaves a 12 km gap at the equator.' }),
    );
    expect(replied.status).toBe(200);
    expect(replied.body.replies.map((r) => [r.author.name, r.body])).toEqual([
      [person('analyst').name, 'The 13-day cycle leaves a 12 km gap at the equator.'],
    ]);
    const n = await reviewer.json<NotificationsRecord>('/api/notifications');
    expect(n.body.unreadCount).toBe(1);
    expect(n.body.items[0]).toMatchObject({
      kind: 'reply',
      threadId: thread.id,
      excerpt: 'The 13-day cycle leaves a 12 km gap at the equator.',
    });
    const all = await configManager.json<{ threads: ThreadRecord[] }>(`/api/memos/${memoId}/comments`);
    expect(all.status).toBe(200);
    expect(all.body.threads.find((t) => t.id === thread.id)?.replies).toHaveLength(1);
  });

  it('the reviewer may not resolve (403 naming why); the analyst resolves and reopens', async () => {
    const refused = await reviewer.json<ErrorBody>(`/api/comments/${thread.id}`, patch({ action: 'resolve' }));
    expect(refused.status).toBe(403);
    expect(refused.body.error).toBe('Only the memo’s authors resolve or reopen threads; reviewers may reply.');

    const resolved = await analyst.json<ThreadRecord>(`/api/comments/${thread.id}`, patch({ action: 'resolve' }));
    expect(resolved.status).toBe(200);
    expect(resolved.body).toMatchObject({ status: 'resolved', resolvedBy: { name: person('analyst').name } });
    expect((await analyst.json<ErrorBody>(`/api/comments/${thread.id}`, patch({ action: 'resolve' }))).status).toBe(
      409,
    );
    let list = await analyst.json<{ memos: MemoSummary[] }>('/api/memos');
    expect(list.body.memos.find((m) => m.id === memoId)!.openThreads).toBe(openBefore);

    const reopened = await analyst.json<ThreadRecord>(`/api/comments/${thread.id}`, patch({ action: 'reopen' }));
    expect(reopened.status).toBe(200);
    expect(reopened.body).toMatchObject({ status: 'open', resolvedBy: null, resolvedAt: null });
    const n = await reviewer.json<NotificationsRecord>('/api/notifications');
    expect(n.body.items.slice(0, 2).map((i) => i.kind)).toEqual(['reopened', 'resolved']);
    list = await analyst.json<{ memos: MemoSummary[] }>('/api/memos');
    expect(list.body.memos.find((m) => m.id === memoId)!.openThreads).toBe(openBefore + 1);
  });

  it('marks notifications read for one memo', async () => {
    const marked = await reviewer.json<{ marked: number; unreadCount: number }>(
      '/api/notifications/read',
      json({ memoId }),
    );
    expect(marked.status).toBe(200);
    expect(marked.body).toEqual({ marked: 3, unreadCount: 0 });
    expect((await reviewer.json<NotificationsRecord>('/api/notifications')).body.items.every((i) => i.read)).toBe(true);
  });

  it('404 for an unknown comment or memo', async () => {
    expect((await analyst.json('/api/comments/999999', patch({ action: 'resolve' }))).status).toBe(404);
    expect((await analyst.json('/api/memos/999999/comments')).status).toBe(404);
  });
});

import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';
import type { MemoDetail, PersonRef } from '@/lib/memos/memo-record';
import type { TiptapNode } from '@/lib/memos/memo-schema';

/**
 * Who may write a memo, and what a caller who may not see a memo learns
 * about it, over HTTP against the real server:
 * - the owner and the co-authors the owner adds (analysts only) edit,
 *   submit, settle threads and reopen; other analysts read and comment;
 *   only the owner changes the co-authors, and each change is audited;
 * - a hidden memo answers every route exactly as an unknown id does (same
 *   status, same body), for a customer and for a reviewer not assigned.
 */

const demo = (role: Role) => DEMO_USERS.find((u) => u.role === role)!;
type ErrorBody = { error: string; code: string; fields?: Record<string, string> };
const send = (method: string, body: unknown) => ({ method, body: JSON.stringify(body) });

async function signedIn(email: string, password: string): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(email, password), `sign in as ${email}`).toBe(true);
  return s;
}

const stamp = Date.now();
let admin: HttpSession;
let ilse: HttpSession; // the demo analyst, owner of the memo below
let oriel: HttpSession; // analyst, made co-author
let bram: HttpSession; // analyst, never an author
let ilseId: number;
let orielId: number;
let bramId: number;
let reviewerId: number;
let memoId: number;

async function addPerson(name: string, role: Role): Promise<{ id: number; session: HttpSession }> {
  const email = `${name.toLowerCase().replace(/\s+/g, '.')}.${stamp}@brightwater.example`;
  const made = await admin.json<{ id: number }>(
    '/api/users',
    send('POST', { email, name, role, password: 'ownership-trial-pw' }),
  );
  expect(made.status, `create ${name}`).toBe(201);
  return { id: made.body.id, session: await signedIn(email, 'ownership-trial-pw') };
}

beforeAll(async () => {
  admin = await signedIn(demo('admin').email, DEMO_PASSWORD);
  ilse = await signedIn(demo('analyst').email, DEMO_PASSWORD);
  ({ id: orielId, session: oriel } = await addPerson('Oriel Vance', 'analyst'));
  ({ id: bramId, session: bram } = await addPerson('Bram Tessaly', 'analyst'));
  const users = await admin.json<{ users: { id: number; email: string; role: Role }[] }>('/api/users');
  ilseId = users.body.users.find((u) => u.email === demo('analyst').email)!.id;
  reviewerId = users.body.users.find((u) => u.email === demo('reviewer').email)!.id;
  const created = await ilse.json<{ id: number }>(
    '/api/memos',
    send('POST', { title: 'Ownership trial: drag make-up budget', templateId: 'sso-design-rationale' }),
  );
  expect(created.status).toBe(201);
  memoId = created.body.id;
});

const memo = (who: HttpSession) => who.json<MemoDetail>(`/api/memos/${memoId}`);
const save = async (who: HttpSession, title: string) =>
  who.json<MemoDetail & ErrorBody>(
    `/api/memos/${memoId}`,
    send('PATCH', { title, baseVersion: (await memo(ilse)).body.version }),
  );
const coAuthors = (who: HttpSession, userIds: unknown) =>
  who.json<{ coAuthors: PersonRef[] } & ErrorBody>(`/api/memos/${memoId}/co-authors`, send('PUT', { userIds }));

describe('owner and co-authors', () => {
  it('another analyst reads and comments, but may not edit, submit, settle threads or name co-authors (403, saying why)', async () => {
    expect((await memo(bram)).status).toBe(200);
    expect((await memo(bram)).body.allowedActions).toEqual(expect.arrayContaining(['memo.view', 'memo.comment']));
    expect((await memo(bram)).body.allowedActions).not.toContain('memo.edit');
    expect((await memo(bram)).body.editRefusal).toBe(
      'Only the memo’s owner and its co-authors may do this; other analysts read and comment.',
    );
    expect((await memo(ilse)).body.editRefusal).toBeNull();
    const edit = await save(bram, 'Not my memo');
    expect(edit.status).toBe(403);
    expect(edit.body.error).toBe(
      'Only the memo’s owner and its co-authors may do this; other analysts read and comment.',
    );
    expect(
      (
        await bram.json(
          `/api/memos/${memoId}/transitions`,
          send('POST', { action: 'submit', reviewerIds: [reviewerId] }),
        )
      ).status,
    ).toBe(403);
    const thread = await bram.json<{ id: number }>(
      `/api/memos/${memoId}/comments`,
      send('POST', {
        body: 'Is the drag make-up budget per year?',
        anchor: { quote: 'TERNLIGHT-1', prefix: '', suffix: '' },
      }),
    );
    expect(thread.status).toBe(201);
    expect((await bram.json(`/api/comments/${thread.body.id}`, send('PATCH', { action: 'resolve' }))).status).toBe(403);
    expect(
      (
        await bram.json(
          `/api/comments/${thread.body.id}`,
          send('PATCH', { action: 'reply', body: 'Answering myself.' }),
        )
      ).status,
    ).toBe(200);
    const refused = await coAuthors(bram, [bramId]);
    expect(refused.status).toBe(403);
    expect(refused.body.error).toBe('Only the memo’s owner adds or removes co-authors.');
  });

  it('the owner adds a co-author, who may then edit; bad lists are refused naming the field', async () => {
    expect((await coAuthors(ilse, 'everyone')).status).toBe(400);
    const reviewer = await coAuthors(ilse, [reviewerId]);
    expect(reviewer.status).toBe(400);
    expect(reviewer.body.fields?.userIds).toBe(`not an active analyst: ${reviewerId}`);
    const self = await coAuthors(ilse, [ilseId]);
    expect(self.status).toBe(400);
    expect(self.body.fields?.userIds).toBe(`user ${ilseId} owns the memo`);
    expect((await coAuthors(ilse, [999_999])).status).toBe(400);

    const added = await coAuthors(ilse, [orielId]);
    expect(added.status).toBe(200);
    expect(added.body.coAuthors).toEqual([{ id: orielId, name: 'Oriel Vance' }]);
    expect((await memo(bram)).body.coAuthors).toEqual([{ id: orielId, name: 'Oriel Vance' }]);
    const edit = await save(oriel, 'Ownership trial: drag make-up budget (Oriel)');
    expect(edit.status).toBe(200);
    expect(edit.body.title).toBe('Ownership trial: drag make-up budget (Oriel)');
    // A co-author writes, but the list of authors stays the owner's.
    expect((await coAuthors(oriel, [orielId, bramId])).status).toBe(403);
    expect((await save(bram, 'Still not mine')).status).toBe(403);
  });

  it('the owner removes the co-author, who is then refused; each change is in the audit trail', async () => {
    expect((await coAuthors(ilse, [])).body.coAuthors).toEqual([]);
    expect((await save(oriel, 'Too late')).status).toBe(403);
    const trail = await admin.json<{
      events: { action: string; actorEmail: string; details: { added: string[]; removed: string[] } }[];
    }>(`/api/audit?action=memo.co-authors&memoId=${memoId}`);
    expect(trail.status).toBe(200);
    expect(trail.body.events.map((e) => [e.actorEmail, e.details.added, e.details.removed])).toEqual([
      [demo('analyst').email, [], ['Oriel Vance']],
      [demo('analyst').email, ['Oriel Vance'], []],
    ]);
  });
});

/** The first figure id in a document, to ask for a figure that exists in the hidden memo. */
function firstFigureId(node: TiptapNode): string | undefined {
  if (node.type === 'figure' && typeof node.attrs?.figureId === 'string') return node.attrs.figureId;
  for (const child of node.content ?? []) {
    const id = firstFigureId(child);
    if (id) return id;
  }
  return undefined;
}

// A 1 × 1 PNG (the smallest valid image the attachment check accepts).
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
  'base64',
);

describe('a hidden memo answers exactly like an unknown one', () => {
  const UNKNOWN = 987_654;
  let hiddenAttachment: number;
  let hiddenComment: number;
  let figureId: string;
  let outsiders: [string, HttpSession][];

  beforeAll(async () => {
    const form = new FormData();
    form.append('file', new Blob([PNG], { type: 'image/png' }), 'dot.png');
    const uploaded = await ilse.json<{ id: number }>(`/api/memos/${memoId}/attachments`, {
      method: 'POST',
      body: form,
      headers: { origin: inject('baseUrl') },
    });
    expect(uploaded.status).toBe(201);
    hiddenAttachment = uploaded.body.id;
    const thread = await ilse.json<{ id: number }>(
      `/api/memos/${memoId}/comments`,
      send('POST', { body: 'Check the decay figure.', anchor: { quote: 'TERNLIGHT-1', prefix: '', suffix: '' } }),
    );
    hiddenComment = thread.body.id;
    figureId = firstFigureId((await memo(ilse)).body.content) ?? 'fig-none';
    const { session: otherReviewer } = await addPerson('Hale Ostrander', 'reviewer');
    outsiders = [
      ['customer', await signedIn(demo('customer').email, DEMO_PASSWORD)],
      ['reviewer not assigned', otherReviewer],
    ];
  });

  const routes = (id: number, attachmentId: number, commentId: number): [string, string, RequestInit?][] => [
    ['memo', `/api/memos/${id}`],
    ['save', `/api/memos/${id}`, send('PATCH', { title: 'probe', baseVersion: 1 })],
    ['versions', `/api/memos/${id}/versions`],
    ['one version', `/api/memos/${id}/versions/1`],
    ['name a version', `/api/memos/${id}/versions/1/label`, send('POST', { label: 'probe' })],
    ['comments', `/api/memos/${id}/comments`],
    [
      'new comment',
      `/api/memos/${id}/comments`,
      send('POST', { body: 'probe', anchor: { quote: 'TERNLIGHT-1', prefix: '', suffix: '' } }),
    ],
    ['pdf', `/api/memos/${id}/pdf`],
    ['figure', `/api/memos/${id}/figures/${figureId}`],
    ['diff', `/api/memos/${id}/diff?from=v1&to=current`],
    [
      'transition submit',
      `/api/memos/${id}/transitions`,
      send('POST', { action: 'submit', reviewerIds: [reviewerId] }),
    ],
    ['transition reopen', `/api/memos/${id}/transitions`, send('POST', { action: 'reopen' })],
    ['revisions', `/api/memos/${id}/revisions`],
    ['revision pdf', `/api/memos/${id}/revisions/A/pdf`],
    ['acknowledgement', `/api/memos/${id}/revisions/A/acknowledgement`, send('POST', {})],
    ['co-authors', `/api/memos/${id}/co-authors`, send('PUT', { userIds: [] })],
    ['distribution', `/api/memos/${id}/distribution`],
    ['deliveries', `/api/memos/${id}/deliveries`],
    ['attachment', `/api/attachments/${attachmentId}`],
    ['thread action', `/api/comments/${commentId}`, send('PATCH', { action: 'reply', body: 'probe' })],
  ];

  it('for a customer and for a reviewer not assigned: every route, same status and same body for the hidden id and an unknown id', async () => {
    for (const [who, session] of outsiders) {
      const hidden = routes(memoId, hiddenAttachment, hiddenComment);
      const unknown = routes(UNKNOWN, UNKNOWN, UNKNOWN);
      for (let i = 0; i < hidden.length; i++) {
        const [name, path, init] = hidden[i];
        const a = await session.json(path, init);
        const b = await session.json(unknown[i][1], unknown[i][2]);
        expect({ status: a.status, body: a.body }, `${who}: ${name}`).toEqual({ status: b.status, body: b.body });
        expect(a.status, `${who}: ${name}`).toBe(404);
        expect(a.body, `${who}: ${name}`).toEqual({ error: 'Not found, or not shared with you.', code: 'not_found' });
      }
    }
  });
});

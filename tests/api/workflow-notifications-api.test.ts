import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { HttpSession } from '../../scripts/support/http-session';
import { demoEmail, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import type { OutboxDetail, OutboxSummary } from '@/lib/mail/list-outbox-messages';
import type { NotificationsRecord } from '@/lib/comments/comment-record';

/**
 * Review notifications over HTTP against the real app and its local SMTP
 * server (npm smtp-server, every message kept in the Outbox): each
 * transition tells the right people, in the app and by e-mail, with its
 * note; a kind a person switched off sends them no mail but still shows
 * in the app. Mail goes out after the transition's commit, so the test
 * polls the Outbox (at most 15 s) rather than expecting it at once.
 */

// Its own app instance: releases to the demo customer must not change what other test files see.
let app: AppServer;
let baseUrl = '';
const TITLE = `TERNLIGHT-1 notification trial ${Date.now().toString(36)}`;
let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, admin: HttpSession, customer: HttpSession;
let coAuthor: HttpSession;
let coAuthorEmail = '';
let memoId = 0;
let reviewerId = 0;

const move = (who: HttpSession, body: Record<string, unknown>) =>
  who.json<{ memo: { status: string } }>(`/api/memos/${memoId}/transitions`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

/** This memo's messages to one address, as the local SMTP server received them (subject and text). */
async function mailsTo(email: string): Promise<{ subject: string; text: string }[]> {
  const list = (
    await admin.json<{ messages: OutboxSummary[] }>(`/api/outbox?to=${encodeURIComponent(email)}`)
  ).body.messages.filter((m) => m.subject?.includes(TITLE));
  const details = await Promise.all(
    list.map(async (m) => (await admin.json<OutboxDetail>(`/api/outbox/${m.id}`)).body),
  );
  return details.map((d) => ({ subject: d.subject ?? '', text: d.text ?? '' }));
}

/** Waits until `email` has `count` messages of this memo whose subject starts with `prefix`; returns them. */
async function waitForMails(email: string, prefix: string, count: number) {
  let found: { subject: string; text: string }[] = [];
  for (let i = 0; i < 60; i++) {
    found = (await mailsTo(email)).filter((m) => m.subject.startsWith(prefix));
    if (found.length >= count) break;
    await new Promise((r) => setTimeout(r, 250));
  }
  return found;
}

const kindsInApp = async (who: HttpSession) =>
  (await who.json<NotificationsRecord>('/api/notifications')).body.items.filter((n) => n.memo.id === memoId);

beforeAll(async () => {
  app = await startAppServer();
  baseUrl = app.baseUrl;
  [analyst, reviewer, cm, admin, customer] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'admin', 'customer'] as const).map((r) => signedIn(baseUrl, r)),
  );
  coAuthorEmail = `wren.alder.${Date.now().toString(36)}@brightwater.example`;
  const made = await admin.json<{ id: number }>('/api/users', {
    method: 'POST',
    body: JSON.stringify({
      email: coAuthorEmail,
      name: 'Wren Alder',
      role: 'analyst',
      password: 'notification-trial-pw',
    }),
  });
  expect(made.status).toBe(201);
  coAuthor = new HttpSession(baseUrl);
  expect(await coAuthor.signIn(coAuthorEmail, 'notification-trial-pw')).toBe(true);

  const created = await analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: TITLE, templateId: 'sso-design-rationale' }),
  });
  memoId = created.body.id;
  expect(
    (
      await analyst.json(`/api/memos/${memoId}/co-authors`, {
        method: 'PUT',
        body: JSON.stringify({ userIds: [made.body.id] }),
      })
    ).status,
  ).toBe(200);
  reviewerId = (
    await analyst.json<{ users: { id: number; name: string }[] }>('/api/users?role=reviewer')
  ).body.users.find((u) => u.name === 'Tobias Quenby')!.id;
}, 300_000);
afterAll(() => app?.stop());

describe('notification e-mail settings', () => {
  it('are the signed-in person’s own: all on at first, switched per kind, bad input refused with a field message, customers refused', async () => {
    const first = await reviewer.json<{ email: Record<string, boolean> }>('/api/me/notification-settings');
    expect(first.status).toBe(200);
    expect(Object.keys(first.body.email).sort()).toEqual([
      'approved',
      'changes-requested',
      'frozen',
      'released',
      'submitted',
    ]);
    const off = await reviewer.json<{ email: Record<string, boolean> }>('/api/me/notification-settings', {
      method: 'PUT',
      body: JSON.stringify({ email: { frozen: false } }),
    });
    expect(off.status).toBe(200);
    expect(off.body.email).toMatchObject({ frozen: false, submitted: true });
    // Another person's settings are untouched.
    expect(
      (await analyst.json<{ email: Record<string, boolean> }>('/api/me/notification-settings')).body.email.frozen,
    ).toBe(true);

    const bad = await reviewer.json<{ fields: Record<string, string> }>('/api/me/notification-settings', {
      method: 'PUT',
      body: JSON.stringify({ email: { frozen: 'no' } }),
    });
    expect(bad.status).toBe(400);
    expect(bad.body.fields['email.frozen']).toBe('frozen must be true or false');
    const unknown = await reviewer.json('/api/me/notification-settings', {
      method: 'PUT',
      body: JSON.stringify({ email: { lunch: true } }),
    });
    expect(unknown.status).toBe(400);
    expect((await customer.json('/api/me/notification-settings')).status).toBe(403);
  });
});

describe('each transition tells the right people with the note', () => {
  it('submitted: the reviewer, with the submit note; not the analyst who submitted', async () => {
    expect(
      (
        await move(analyst, {
          action: 'submit',
          reviewerIds: [reviewerId],
          note: 'Please check the drag budget in section 4.',
        })
      ).status,
    ).toBe(200);
    const mails = await waitForMails(demoEmail('reviewer'), 'For your review:', 1);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain('Please check the drag budget in section 4.');
    expect(mails[0].text).toContain(`${baseUrl}/memos/${memoId}`);
    expect(await kindsInApp(reviewer)).toEqual([
      expect.objectContaining({
        kind: 'submitted',
        note: 'Please check the drag budget in section 4.',
        mail: expect.stringMatching(/queued|sending|sent/),
      }),
    ]);
    expect(await mailsTo(demoEmail('analyst'))).toEqual([]);
  });

  it('changes requested: owner and co-author, with the reviewer’s note', async () => {
    expect(
      (
        await move(reviewer, {
          action: 'request-changes',
          note: 'State the solar-flux assumption behind the lifetime.',
          password: DEMO_PASSWORD,
        })
      ).status,
    ).toBe(200);
    for (const email of [demoEmail('analyst'), coAuthorEmail]) {
      const mails = await waitForMails(email, 'Changes requested:', 1);
      expect(mails, email).toHaveLength(1);
      expect(mails[0].text).toContain('State the solar-flux assumption behind the lifetime.');
    }
    expect((await mailsTo(demoEmail('config-manager'))).length).toBe(0);
  });

  it('approved: owner, co-author and configuration managers, with the note', async () => {
    expect(
      (await move(analyst, { action: 'submit', reviewerIds: [reviewerId], note: 'Assumption stated in 5.2.' })).status,
    ).toBe(200);
    expect(
      (
        await move(reviewer, {
          action: 'approve',
          note: 'Sound; flux assumption now explicit.',
          password: DEMO_PASSWORD,
        })
      ).body.memo.status,
    ).toBe('approved');
    for (const email of [demoEmail('analyst'), coAuthorEmail, demoEmail('config-manager')]) {
      const mails = await waitForMails(email, 'Approved:', 1);
      expect(mails, email).toHaveLength(1);
      expect(mails[0].text).toContain('Sound; flux assumption now explicit.');
    }
    expect((await kindsInApp(cm)).map((n) => n.kind)).toEqual(['approved']);
  });

  it('frozen: owner and co-author by mail with the change summary; the reviewer, who switched it off, only in the app', async () => {
    const frozen = await cm.json<{ revision: { letter: string } }>(`/api/memos/${memoId}/transitions`, {
      method: 'POST',
      body: JSON.stringify({
        action: 'freeze',
        changeSummary: 'First baseline of the TERNLIGHT-1 orbit.',
        password: DEMO_PASSWORD,
      }),
    });
    expect(frozen.status).toBe(200);
    for (const email of [demoEmail('analyst'), coAuthorEmail]) {
      const mails = await waitForMails(email, 'Frozen as revision A:', 1);
      expect(mails, email).toHaveLength(1);
      expect(mails[0].text).toContain('First baseline of the TERNLIGHT-1 orbit.');
    }
    const inApp = (await kindsInApp(reviewer)).find((n) => n.kind === 'frozen');
    expect(inApp).toMatchObject({
      revisionLetter: 'A',
      note: 'First baseline of the TERNLIGHT-1 orbit.',
      mail: null,
      read: false,
    });
    // Give a stray mail time to arrive before saying there is none.
    await waitForMails(demoEmail('reviewer'), 'Frozen', 1);
    expect((await mailsTo(demoEmail('reviewer'))).map((m) => m.subject.split(':')[0])).toEqual([
      'For your review',
      'For your review',
    ]);
  });

  it('released: the owner, with the cover note', async () => {
    const samirId = (
      await cm.json<{ users: { id: number; name: string }[] }>('/api/users?role=customer')
    ).body.users.find((u) => u.name === 'Samir Dunmore')!.id;
    expect(
      (
        await cm.json(`/api/memos/${memoId}/distribution`, {
          method: 'POST',
          body: JSON.stringify({ userId: samirId }),
        })
      ).status,
    ).toBe(201);
    expect(
      (
        await cm.json(`/api/memos/${memoId}/revisions/A/releases`, {
          method: 'POST',
          body: JSON.stringify({ recipientIds: 'all', coverNote: 'For the Northmere board meeting.' }),
        })
      ).status,
    ).toBe(201);
    const mails = await waitForMails(demoEmail('analyst'), 'Revision A released to customers:', 1);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain('For the Northmere board meeting.');
    expect((await mailsTo(coAuthorEmail)).filter((m) => m.subject.startsWith('Revision A released'))).toEqual([]);
    expect((await kindsInApp(analyst)).map((n) => n.kind)).toEqual([
      'released',
      'frozen',
      'approved',
      'changes-requested',
    ]);
  });
});

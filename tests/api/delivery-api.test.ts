import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { freePort, startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { CollectingSmtpServer } from '../support/collecting-smtp-server';
import { demoEmail, demoReviewerId, frozenMemo, linkToken, signedIn, signInWithLink } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import type { DeliveryRecord, PortalEntry, ReleaseRecord, RevisionDeliveries } from '@/lib/delivery/delivery-record';
import type { OutboxDetail, OutboxSummary } from '@/lib/mail/list-outbox-messages';

/**
 * Delivery over HTTP against the real app and its real local SMTP server
 * (npm smtp-server); a second app instance sends through SMTP_URL to an
 * smtp-server this test stops and starts. Reply codes: RFC 5321 §4.2.
 * Both instances are this file's own, so the releases and invited accounts
 * made here do not change what other test files find on the shared server.
 */

let app1: AppServer;
let baseUrl = '';
let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, admin: HttpSession;
let memoId = 0;
let sha256 = '';
let samirId = 0;
let token = '';

beforeAll(async () => {
  app1 = await startAppServer();
  baseUrl = app1.baseUrl;
  [analyst, reviewer, cm, admin] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'admin'] as const).map((r) => signedIn(baseUrl, r)),
  );
  ({ memoId, sha256 } = await frozenMemo({ analyst, reviewer, cm }, 'TERNLIGHT-1 delivery trial'));
  const customers = await cm.json<{ users: { id: number; name: string }[] }>('/api/users?role=customer');
  samirId = customers.body.users.find((u) => u.name === 'Samir Dunmore')!.id;
}, 300_000);
afterAll(() => app1?.stop());

const outboxFor = async (email: string) =>
  (await admin.json<{ messages: OutboxSummary[] }>(`/api/outbox?to=${encodeURIComponent(email)}`)).body.messages;

describe('distribution list and release', () => {
  it('adds a customer and invites an address; refuses bad input with field messages, staff accounts and other roles', async () => {
    const add = await cm.json<{ contact: { userId: number; state: string } }>(`/api/memos/${memoId}/distribution`, {
      method: 'POST',
      body: JSON.stringify({ userId: samirId }),
    });
    expect(add.status).toBe(201);
    expect(add.body.contact).toMatchObject({ userId: samirId, state: 'active' });
    const invite = await cm.json<{ contact: { state: string; email: string }; invitation: { sent: boolean } }>(
      `/api/memos/${memoId}/distribution`,
      { method: 'POST', body: JSON.stringify({ email: 'Ines.Palk@northmere-basin.example', name: 'Ines Palk' }) },
    );
    expect(invite.status).toBe(201);
    expect(invite.body).toMatchObject({
      contact: { state: 'invited', email: 'ines.palk@northmere-basin.example' },
      invitation: { sent: true },
    });
    expect((await outboxFor('ines.palk@northmere-basin.example')).map((m) => m.subject)).toEqual([
      'Your invitation to Nodewright',
    ]);

    const bad = await cm.json<{ fields: Record<string, string> }>(`/api/memos/${memoId}/distribution`, {
      method: 'POST',
      body: JSON.stringify({ email: 'not an address', name: 'X' }),
    });
    expect(bad.status).toBe(400);
    expect(bad.body.fields.email).toBe('e-mail address is not valid');
    const staff = await cm.json<{ fields: Record<string, string> }>(`/api/memos/${memoId}/distribution`, {
      method: 'POST',
      body: JSON.stringify({ email: demoEmail('reviewer'), name: 'T' }),
    });
    expect(staff.status).toBe(409);
    expect(staff.body.fields.email).toBe('not a customer account');
    expect(
      (
        await cm.json(`/api/memos/${memoId}/distribution`, {
          method: 'POST',
          body: JSON.stringify({ userId: samirId }),
        })
      ).status,
    ).toBe(409);
    expect(
      (
        await analyst.json(`/api/memos/${memoId}/distribution`, {
          method: 'POST',
          body: JSON.stringify({ userId: samirId }),
        })
      ).status,
    ).toBe(403);
    expect((await cm.json(`/api/memos/${memoId}/distribution`, { method: 'POST', body: '{not json' })).status).toBe(
      400,
    );
  });

  it('refuses a release without a cover note, to strangers, by other roles, of an unknown revision', async () => {
    const post = (who: HttpSession, letter: string, body: unknown) =>
      who.json<{ fields: Record<string, string> }>(`/api/memos/${memoId}/revisions/${letter}/releases`, {
        method: 'POST',
        body: JSON.stringify(body),
      });
    const noNote = await post(cm, 'A', { recipientIds: 'all', coverNote: '   ' });
    expect([noNote.status, noNote.body.fields.coverNote]).toEqual([400, 'a cover note is required']);
    const stranger = await post(cm, 'A', { recipientIds: [999999], coverNote: 'x' });
    expect([stranger.status, stranger.body.fields.recipientIds]).toEqual([400, 'not on the distribution list: 999999']);
    expect((await post(cm, 'A', { recipientIds: 'some', coverNote: 'x' })).body.fields.recipientIds).toBe(
      'recipientIds must be "all" or a list of contact ids',
    );
    expect((await post(analyst, 'A', { recipientIds: 'all', coverNote: 'x' })).status).toBe(403);
    expect((await post(cm, 'Q', { recipientIds: 'all', coverNote: 'x' })).status).toBe(404);
    expect((await post(cm, 'a1', { recipientIds: 'all', coverNote: 'x' })).status).toBe(400);
  });

  it('releases revision A: one message per recipient with the stored PDF attached and a link for that recipient', async () => {
    const res = await cm.json<ReleaseRecord>(`/api/memos/${memoId}/revisions/A/releases`, {
      method: 'POST',
      body: JSON.stringify({
        recipientIds: [samirId],
        coverNote: 'Baseline orbit for your review board on 14 January.',
      }),
    });
    expect(res.status).toBe(201);
    expect(res.body.deliveries).toHaveLength(1);
    expect(res.body.deliveries[0]).toMatchObject({
      recipient: { id: samirId, email: demoEmail('customer') },
      status: 'delivered',
      attempts: 1,
      pdfAttached: true,
      error: null,
    });

    const messages = await outboxFor(demoEmail('customer'));
    const mine = messages.filter((m) => m.subject?.includes('TERNLIGHT-1 delivery trial'));
    expect(mine).toHaveLength(1);
    const msg = (await admin.json<OutboxDetail>(`/api/outbox/${mine[0].id}`)).body;
    expect(msg.subject).toMatch(/^Revision A of DM-\d{4}-\d{3} released: TERNLIGHT-1 delivery trial$/);
    expect(msg.envelopeTo).toEqual([demoEmail('customer')]);
    expect(msg.text).toContain('Baseline orbit for your review board on 14 January.');
    expect(msg.text).toContain(sha256);
    expect(msg.attachmentList).toEqual([expect.objectContaining({ contentType: 'application/pdf', sha256 })]);
    const bytes = Buffer.from(
      await (await admin.request(`/api/outbox/${msg.id}/attachments/${msg.attachmentList[0].id}`)).arrayBuffer(),
    );
    expect(crypto.createHash('sha256').update(bytes).digest('hex')).toBe(sha256);
    token = linkToken(msg.text);
    expect(msg.text).toContain(`${baseUrl}/delivery/${token}`);
    expect((await cm.json('/api/outbox')).status).toBe(403);
  });
});

describe('the customer following the link', () => {
  let samir: HttpSession;
  it('the link page offers the revision without spending the link; the button signs Samir in once', async () => {
    const page = await fetch(`${baseUrl}/delivery/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('Open revision A');
    samir = new HttpSession(baseUrl);
    expect(await signInWithLink(samir, token)).toBe(true);
    expect((await samir.json<{ user: { email: string } }>('/api/auth/session')).body.user.email).toBe(
      demoEmail('customer'),
    );
  });

  it('sees exactly that revision: its PDF with the stored SHA-256, and no drafts, threads, versions or tracking', async () => {
    const portal = await samir.json<{ revisions: PortalEntry[] }>('/api/portal');
    expect(
      portal.body.revisions.filter((r) => r.memoId === memoId).map((r) => [r.letter, r.pdfSha256, r.coverNote]),
    ).toEqual([['A', sha256, 'Baseline orbit for your review board on 14 January.']]);
    const pdf = await samir.request(`/api/memos/${memoId}/revisions/A/pdf`);
    expect(pdf.status).toBe(200);
    expect(
      crypto
        .createHash('sha256')
        .update(Buffer.from(await pdf.arrayBuffer()))
        .digest('hex'),
    ).toBe(sha256);
    for (const p of [
      `/api/memos/${memoId}/comments`,
      `/api/memos/${memoId}/versions`,
      `/api/memos/${memoId}/deliveries`,
      `/api/memos/${memoId}/distribution`,
    ]) {
      expect((await samir.json(p)).status, p).toBe(403);
    }
    // A memo never released to them is hidden: 404, as for an unknown memo.
    for (const p of ['/api/memos/1', '/api/memos/1/revisions/A/pdf']) expect((await samir.json(p)).status, p).toBe(404);
    const list = await samir.json<{ memos: { id: number; status: string }[] }>('/api/memos');
    expect(list.body.memos.every((m) => m.status === 'frozen')).toBe(true);
    expect(list.body.memos.map((m) => m.id)).toContain(memoId);
  });

  it('a used link is refused on the page and for signing in; forged and expired links get their own clear page', async () => {
    expect(await (await fetch(`${baseUrl}/delivery/${token}`)).text()).toContain('This link has already been used');
    expect(await signInWithLink(new HttpSession(baseUrl), token)).toBe(false);
    const [body, sig] = token.split('.');
    const flipped = `${body}.${sig.slice(0, -2)}${sig.endsWith('AA') ? 'BB' : 'AA'}`;
    const forgedPage = await (await fetch(`${baseUrl}/delivery/${flipped}`)).text();
    expect(forgedPage).toContain('This link is not valid');
    expect(forgedPage).not.toContain('Open revision');
    expect(await signInWithLink(new HttpSession(baseUrl), flipped)).toBe(false);

    // An expired link signed with the server's own key (the test reads the generated secret from the app's data folder).
    process.env.NEXTAUTH_SECRET = fs.readFileSync(path.join(app1.dataDir, 'nextauth-secret'), 'utf8').trim();
    const { signClaims, readClaims } = await import('@/lib/delivery/link-token');
    const claims = readClaims(token)!;
    expect(claims.userId).toBe(samirId);
    const expired = signClaims({ ...claims, expiresAt: new Date(Date.now() - 60_000) });
    const expiredPage = await (await fetch(`${baseUrl}/delivery/${expired}`)).text();
    expect(expiredPage).toContain('This link has expired');
    expect(await signInWithLink(new HttpSession(baseUrl), expired)).toBe(false);
  });

  it('acknowledges receipt; the tracking shows delivered, first opened and acknowledged; all of it is in the audit trail', async () => {
    const ack = await samir.json<{ acknowledgedAt: string }>(`/api/memos/${memoId}/revisions/A/acknowledgement`, {
      method: 'POST',
      body: '{}',
    });
    expect(ack.status).toBe(200);
    expect(
      (await cm.json(`/api/memos/${memoId}/revisions/A/acknowledgement`, { method: 'POST', body: '{}' })).status,
    ).toBe(403);
    const tracking = await cm.json<{ revisions: RevisionDeliveries[] }>(`/api/memos/${memoId}/deliveries`);
    const d = tracking.body.revisions[0].releases[0].deliveries[0];
    expect(tracking.body.revisions.map((r) => r.letter)).toEqual(['A']);
    expect(d.status).toBe('delivered');
    expect(Date.parse(d.deliveredAt!)).toBeGreaterThanOrEqual(Date.parse(d.sentAt!));
    expect(Date.parse(d.firstOpenedAt!)).toBeGreaterThanOrEqual(Date.parse(d.deliveredAt!));
    expect(d.acknowledgedAt).toBe(ack.body.acknowledgedAt);
    const trail = await admin.json<{ events: { action: string; actorEmail: string | null }[] }>(
      `/api/audit?memoId=${memoId}&limit=200`,
    );
    const actions = trail.body.events.map((e) => e.action);
    for (const a of [
      'distribution.add',
      'invitation.sent',
      'revision.release',
      'delivery.sent',
      'delivery.open',
      'delivery.ack',
    ])
      expect(actions, a).toContain(a);
    expect(trail.body.events.find((e) => e.action === 'delivery.ack')?.actorEmail).toBe(demoEmail('customer'));
  });

  it('resend to one recipient: a new message with a fresh link; the old one stays spent', async () => {
    const delivery = (await cm.json<{ revisions: RevisionDeliveries[] }>(`/api/memos/${memoId}/deliveries`)).body
      .revisions[0].releases[0].deliveries[0];
    expect((await analyst.json(`/api/deliveries/${delivery.id}/resend`, { method: 'POST', body: '{}' })).status).toBe(
      403,
    );
    const again = await cm.json<DeliveryRecord>(`/api/deliveries/${delivery.id}/resend`, {
      method: 'POST',
      body: '{}',
    });
    expect(again.body).toMatchObject({ status: 'delivered', attempts: 2 });
    const mine = (await outboxFor(demoEmail('customer'))).filter((m) =>
      m.subject?.includes('TERNLIGHT-1 delivery trial'),
    );
    expect(mine).toHaveLength(2);
    const fresh = linkToken((await admin.json<OutboxDetail>(`/api/outbox/${mine[0].id}`)).body.text);
    expect(fresh).not.toBe(token);
    expect(await (await fetch(`${baseUrl}/delivery/${fresh}`)).text()).toContain('Open revision A');
  });

  it('a later revision frozen but not released stays out of reach, while revision A stays available', async () => {
    const move = (who: HttpSession, body: Record<string, unknown>) =>
      who.json(`/api/memos/${memoId}/transitions`, { method: 'POST', body: JSON.stringify(body) });
    const reviewerId = await demoReviewerId(analyst);
    expect((await move(analyst, { action: 'reopen' })).status).toBe(200);
    expect((await samir.request(`/api/memos/${memoId}/revisions/A/pdf`)).status).toBe(200);
    expect((await move(analyst, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(200);
    expect((await move(reviewer, { action: 'approve', password: DEMO_PASSWORD })).status).toBe(200);
    expect(
      (
        await move(cm, {
          action: 'freeze',
          changeSummary: 'Second issue, not for the customer yet.',
          password: DEMO_PASSWORD,
        })
      ).status,
    ).toBe(200);
    expect((await samir.json(`/api/memos/${memoId}/revisions/B/pdf`)).status).toBe(404);
    expect((await samir.json(`/api/memos/${memoId}`)).status).toBe(404);
    expect((await samir.request(`/api/memos/${memoId}/revisions/A/pdf`)).status).toBe(200);
    expect(
      (await samir.json<{ revisions: PortalEntry[] }>('/api/portal')).body.revisions
        .filter((r) => r.memoId === memoId)
        .map((r) => r.letter),
    ).toEqual(['A']);
  });
});

describe('SMTP server down (a second app instance sending through SMTP_URL)', () => {
  let app2: AppServer;
  let smtp: CollectingSmtpServer;
  let received: CollectingSmtpServer['received'];
  const startSmtp = () => smtp.start();

  beforeAll(async () => {
    smtp = new CollectingSmtpServer(await freePort());
    received = smtp.received;
    app2 = await startAppServer({
      SMTP_URL: smtp.url,
      NODEWRIGHT_MAIL_RETRY_SECONDS: '1',
      NODEWRIGHT_MAIL_ATTACHMENT_MAX_BYTES: '1000',
    });
  }, 300_000);
  afterAll(async () => {
    app2?.stop();
    await smtp?.stop();
  });

  it('records the release and the failure, then an automatic retry delivers once the server is back', async () => {
    const [a, r, c] = await Promise.all(
      (['analyst', 'reviewer', 'config-manager'] as const).map((role) => signedIn(app2.baseUrl, role)),
    );
    const { memoId: id } = await frozenMemo(
      { analyst: a, reviewer: r, cm: c },
      'Release while the mail server is down',
    );
    const customer = (await c.json<{ users: { id: number }[] }>('/api/users?role=customer')).body.users[0].id;
    expect(
      (await c.json(`/api/memos/${id}/distribution`, { method: 'POST', body: JSON.stringify({ userId: customer }) }))
        .status,
    ).toBe(201);

    const res = await c.json<ReleaseRecord>(`/api/memos/${id}/revisions/A/releases`, {
      method: 'POST',
      body: JSON.stringify({ recipientIds: 'all', coverNote: 'Sent while the server is down.' }),
    });
    expect(res.status).toBe(201);
    expect(res.body.deliveries[0].status).toBe('failed');
    expect(res.body.deliveries[0].error).toMatch(/ECONNREFUSED|ESOCKET|ECONNECTION/);
    expect(res.body.deliveries[0].nextAttemptAt).not.toBeNull();
    expect(received).toHaveLength(0);
    const trail = await (
      await signedIn(app2.baseUrl, 'admin')
    ).json<{ events: { action: string; details: { error?: string } }[] }>(
      `/api/audit?memoId=${id}&action=delivery.failed`,
    );
    expect(trail.body.events[0]?.details.error).toMatch(/ECONNREFUSED|ESOCKET|ECONNECTION/);

    await startSmtp();
    let d: DeliveryRecord | undefined;
    for (let i = 0; i < 60 && d?.status !== 'delivered'; i++) {
      await new Promise((ok) => setTimeout(ok, 1000));
      d = (await c.json<{ revisions: RevisionDeliveries[] }>(`/api/memos/${id}/deliveries`)).body.revisions[0]
        .releases[0].deliveries[0];
    }
    expect(d?.status).toBe('delivered');
    expect(d!.attempts).toBeGreaterThanOrEqual(2);
    expect(d!.pdfAttached).toBe(false);
    // The review steps' notification mails share the server; the customer's release notice is one message.
    const releaseNotices = received.filter((m) => m.subject?.startsWith('Revision A of'));
    expect(releaseNotices).toHaveLength(1);
    expect(releaseNotices[0].subject).toContain('Release while the mail server is down');
    expect(releaseNotices[0].attachments).toHaveLength(0);
    expect(releaseNotices[0].text).toContain('larger than the 1 KiB this server attaches');
    expect(linkToken(releaseNotices[0].text)).not.toBe('');
    expect(releaseNotices[0].text).toContain(`${app2.baseUrl}/delivery/`);

    // The notification mails that failed while the server was down are retried by the same pass.
    for (let i = 0; i < 60 && !received.some((m) => m.subject?.startsWith('Revision A released to customers:')); i++)
      await new Promise((ok) => setTimeout(ok, 1000));
    expect(
      received
        .filter((m) => m.subject?.startsWith('Revision A released to customers:'))
        .map((m) => m.text?.includes('Sent while the server is down.')),
    ).toEqual([true]);
  }, 120_000);
});

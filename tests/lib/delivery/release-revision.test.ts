import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SMTPServer } from 'smtp-server';
import { AuditEvent, Comment, Delivery, OutboxAttachment, OutboxMessage, User } from '@/models';
import { freshDatabase, makeFrozenRevision, makeMemo, makeUser } from '../../support/factories';
import { startFakeSmtpServer, type RunningSmtpServer } from '@/lib/mail/start-fake-smtp-server';
import { addDistributionContact } from '@/lib/delivery/add-distribution-contact';
import { releaseRevision } from '@/lib/delivery/release-revision';
import { retryDueDeliveries } from '@/lib/delivery/retry-due-deliveries';
import { redeemDeliveryLink } from '@/lib/delivery/redeem-delivery-link';
import { checkToken, signClaims } from '@/lib/delivery/link-token';
import { nextAttemptAt } from '@/lib/delivery/delivery-config';
import { acknowledgeRevision } from '@/lib/delivery/acknowledge-revision';
import { listPortalRevisions } from '@/lib/delivery/list-portal-revisions';
import { acceptInvitation } from '@/lib/delivery/accept-invitation';
import { getRevision } from '@/lib/revisions/list-revisions';
import { getMemo } from '@/lib/memos/get-memo';
import { listThreads } from '@/lib/comments/list-threads';
import { replyToThread } from '@/lib/comments/reply-to-thread';
import { authenticateUser } from '@/lib/users/authenticate-user';
import type { Actor } from '@/lib/auth/permissions';

/**
 * Delivery against the real local SMTP server (npm smtp-server on a loopback
 * port, messages parsed back with mailparser): no transport is mocked.
 * Reply codes are those of RFC 5321 §4.2 (550 mailbox unavailable).
 */

let smtp: RunningSmtpServer;
let cm: Actor, analyst: Actor, samir: Actor, wren: Actor;

const linkIn = (text: string | null) => /\/delivery\/([A-Za-z0-9_.-]+)/.exec(text ?? '')?.[1] ?? '';

async function messagesTo(address: string) {
  const all = await OutboxMessage.findAll({ order: [['id', 'ASC']] });
  return all.filter((m) => m.envelopeTo.includes(address));
}

beforeAll(async () => {
  delete process.env.SMTP_URL;
  process.env.NEXTAUTH_URL = 'http://nodewright.test.example';
  await freshDatabase();
  smtp = await startFakeSmtpServer({ port: 0 });
  [cm, analyst, samir, wren] = [
    await makeUser('config-manager'),
    await makeUser('analyst'),
    await makeUser('customer', 'Samir Dunmore'),
    await makeUser('customer', 'Wren Talbot'),
  ];
});
afterAll(async () => smtp.close());

describe('release over SMTP to the local server', () => {
  it('delivers one message per recipient with the PDF attached, the cover note and a link bound to that recipient', async () => {
    const memo = await makeMemo(analyst, { title: 'TERNLIGHT-1 orbit' });
    const rev = await makeFrozenRevision(memo.id, cm);
    for (const c of [samir, wren]) await addDistributionContact(cm, memo.id, { userId: c.id });
    const release = await releaseRevision(cm, memo.id, 'A', {
      recipientIds: 'all',
      coverNote: 'Baseline for the Northmere review board.',
    });

    expect(release.deliveries.map((d) => [d.recipient.email, d.status, d.attempts, d.pdfAttached])).toEqual([
      [samir.email, 'delivered', 1, true],
      [wren.email, 'delivered', 1, true],
    ]);
    for (const person of [samir, wren]) {
      const [msg] = await messagesTo(person.email);
      expect(msg.subject).toBe(`Revision A of ${memo.documentNumber} released: TERNLIGHT-1 orbit`);
      expect(msg.textBody).toContain('Baseline for the Northmere review board.');
      expect(msg.htmlBody).toContain('Baseline for the Northmere review board.');
      const [att] = await OutboxAttachment.findAll({ where: { messageId: msg.id } });
      expect(att.filename).toBe(`${memo.documentNumber}-rev-A.pdf`);
      expect(att.contentType).toBe('application/pdf');
      expect(att.sha256).toBe(rev.pdfSha256);
      const check = await checkToken(linkIn(msg.textBody), 'delivery');
      expect(check.ok && [check.claims.userId, check.claims.revisionId]).toEqual([person.id, rev.id]);
    }
    expect(await AuditEvent.count({ where: { action: 'delivery.sent', memoId: memo.id } })).toBe(2);
    expect(await AuditEvent.count({ where: { action: 'revision.release', memoId: memo.id } })).toBe(1);
  });

  it('refuses recipients not on the distribution list, with the field named', async () => {
    const memo = await makeMemo(analyst);
    await makeFrozenRevision(memo.id, cm);
    await addDistributionContact(cm, memo.id, { userId: samir.id });
    await expect(releaseRevision(cm, memo.id, 'A', { recipientIds: [wren.id], coverNote: 'x' })).rejects.toMatchObject({
      code: 'bad_request',
      fields: { recipientIds: `not on the distribution list: ${wren.id}` },
    });
    await expect(releaseRevision(analyst, memo.id, 'A', { recipientIds: 'all', coverNote: 'x' })).rejects.toMatchObject(
      { code: 'forbidden' },
    );
    await expect(addDistributionContact(cm, memo.id, { userId: analyst.id })).rejects.toMatchObject({
      code: 'conflict',
      fields: { userId: 'not a customer account' },
    });
  });

  it('sends the link alone when the PDF is larger than the configured limit', async () => {
    process.env.NODEWRIGHT_MAIL_ATTACHMENT_MAX_BYTES = '100';
    try {
      const memo = await makeMemo(analyst);
      await makeFrozenRevision(memo.id, cm, { pdf: Buffer.alloc(4096, 0x25) });
      await addDistributionContact(cm, memo.id, { userId: samir.id });
      const release = await releaseRevision(cm, memo.id, 'A', { recipientIds: [samir.id], coverNote: 'Large one.' });
      expect(release.deliveries[0]).toMatchObject({ status: 'delivered', pdfAttached: false });
      const msg = (await messagesTo(samir.email)).at(-1)!;
      expect(await OutboxAttachment.count({ where: { messageId: msg.id } })).toBe(0);
      expect(msg.textBody).toContain('larger than the 1 KiB this server attaches');
      expect(linkIn(msg.textBody)).not.toBe('');
    } finally {
      delete process.env.NODEWRIGHT_MAIL_ATTACHMENT_MAX_BYTES;
    }
  });
});

describe('links', () => {
  let token = '';
  let revisionId = 0;
  let memoId = 0;
  beforeAll(async () => {
    const memo = await makeMemo(analyst);
    memoId = memo.id;
    revisionId = (await makeFrozenRevision(memo.id, cm)).id;
    await addDistributionContact(cm, memo.id, { userId: samir.id });
    await releaseRevision(cm, memo.id, 'A', { recipientIds: [samir.id], coverNote: 'Links.' });
    token = linkIn((await messagesTo(samir.email)).at(-1)!.textBody);
  });

  it('signs its recipient in once, records the first opening, and is refused when reused', async () => {
    const actor = await redeemDeliveryLink(token);
    expect(actor).toMatchObject({ id: samir.id, role: 'customer' });
    const d = await Delivery.findOne({ where: { revisionId, recipientId: samir.id } });
    expect(d?.firstOpenedAt).toBeInstanceOf(Date);
    expect(await redeemDeliveryLink(token)).toBeNull();
    expect(await checkToken(token, 'delivery')).toMatchObject({ ok: false, reason: 'used' });
  });

  it('refuses a forged token (changed payload or signature) and an expired one signed with the server key', async () => {
    const [body, sig] = token.split('.');
    const otherBody = Buffer.from(
      Buffer.from(body, 'base64url').toString().replace(`.${samir.id}.`, `.${wren.id}.`),
    ).toString('base64url');
    expect(await checkToken(`${otherBody}.${sig}`, 'delivery')).toEqual({ ok: false, reason: 'forged' });
    expect(await checkToken(`${body}.${crypto.randomBytes(32).toString('base64url')}`, 'delivery')).toEqual({
      ok: false,
      reason: 'forged',
    });
    expect(await redeemDeliveryLink('not-a-token')).toBeNull();
    const expired = signClaims({
      purpose: 'delivery',
      userId: samir.id,
      deliveryId: 1,
      revisionId,
      expiresAt: new Date(Date.now() - 1000),
    });
    expect(await checkToken(expired, 'delivery')).toMatchObject({ ok: false, reason: 'expired' });
    expect(await redeemDeliveryLink(expired)).toBeNull();
    // A correctly signed, unexpired token that this server never issued is forged too.
    const neverIssued = signClaims({
      purpose: 'delivery',
      userId: samir.id,
      deliveryId: 1,
      revisionId,
      expiresAt: new Date(Date.now() + 60_000),
    });
    expect(await checkToken(neverIssued, 'delivery')).toEqual({ ok: false, reason: 'forged' });
    expect(await AuditEvent.count({ where: { action: 'delivery.link-refused' } })).toBeGreaterThanOrEqual(3);
  });

  it('the customer sees that revision and acknowledges it; nothing else of the memo', async () => {
    expect((await getRevision(samir, memoId, 'A')).id).toBe(revisionId);
    // Not released to this customer: answered like an unknown revision (404), so nothing can be probed.
    await expect(getRevision(wren, memoId, 'A')).rejects.toMatchObject({ code: 'not_found' });
    await expect(listThreads(samir, memoId)).rejects.toMatchObject({ code: 'forbidden' });
    // A thread on the memo they may read is answered like an unknown comment id: customers never see threads.
    const thread = await Comment.create({
      memoId,
      parentId: null,
      authorId: analyst.id,
      body: 'Internal note',
      anchor: { quote: 'x', prefix: '', suffix: '' },
      status: 'open',
      resolvedBy: null,
      resolvedAt: null,
    });
    const onThread = await replyToThread(samir, thread.id, 'Hello?').catch((e: unknown) => e);
    const onUnknown = await replyToThread(samir, 987_654, 'Hello?').catch((e: unknown) => e);
    expect(onThread).toMatchObject({ code: 'not_found', message: 'Not found, or not shared with you.' });
    expect(onUnknown).toMatchObject({ code: 'not_found', message: 'Not found, or not shared with you.' });
    const ack = await acknowledgeRevision(samir, memoId, 'A');
    expect(Date.now() - Date.parse(ack.acknowledgedAt)).toBeLessThan(10_000);
    expect((await acknowledgeRevision(samir, memoId, 'A')).acknowledgedAt).toBe(ack.acknowledgedAt);
    await expect(acknowledgeRevision(cm, memoId, 'A')).rejects.toMatchObject({ code: 'forbidden' });
    const portal = await listPortalRevisions(samir);
    expect(portal.find((p) => p.memoId === memoId)).toMatchObject({
      letter: 'A',
      acknowledgedAt: ack.acknowledgedAt,
      coverNote: 'Links.',
    });
    expect(portal.every((p) => p.letter === 'A')).toBe(true);
  });

  it('a revision frozen later and not released stays hidden from the customer, as does the memo that now holds it', async () => {
    await makeFrozenRevision(memoId, cm, { letter: 'B' });
    await expect(getRevision(samir, memoId, 'B')).rejects.toMatchObject({
      code: 'not_found',
      message: 'Not found, or not shared with you.',
    });
    await expect(getMemo(samir, memoId)).rejects.toMatchObject({
      code: 'not_found',
      message: 'Not found, or not shared with you.',
    });
    expect((await getRevision(samir, memoId, 'A')).letter).toBe('A');
  });
});

describe('SMTP failures', () => {
  it('server down: the release is recorded, the delivery failed with the error and a retry due; a later retry delivers it', async () => {
    const memo = await makeMemo(analyst);
    await makeFrozenRevision(memo.id, cm);
    await addDistributionContact(cm, memo.id, { userId: wren.id });
    const port = smtp.port;
    await smtp.close();
    const release = await releaseRevision(cm, memo.id, 'A', {
      recipientIds: [wren.id],
      coverNote: 'While the server is down.',
    });
    const d = release.deliveries[0];
    expect(d.status).toBe('failed');
    expect(d.error).toMatch(/ECONNREFUSED|ESOCKET|ECONNECTION/);
    expect(Date.parse(d.nextAttemptAt!) - Date.parse(d.sentAt!)).toBeGreaterThanOrEqual(59_000);
    expect(await AuditEvent.count({ where: { action: 'delivery.failed', memoId: memo.id } })).toBe(1);

    smtp = await startFakeSmtpServer({ port });
    expect(await retryDueDeliveries(new Date())).toEqual([]); // not due yet
    expect(await retryDueDeliveries(new Date(Date.now() + 61_000))).toEqual([d.id]);
    const after = await Delivery.findByPk(d.id, { rejectOnEmpty: true });
    expect([after.status, after.attempts, after.lastError]).toEqual(['delivered', 2, null]);
    expect((await messagesTo(wren.email)).at(-1)?.textBody).toContain('While the server is down.');
  });

  it('server refuses the recipient (550): recorded with the reply, not lost', async () => {
    const refusing = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      onRcptTo(_address, _session, callback) {
        callback(Object.assign(new Error('Mailbox unavailable'), { responseCode: 550 }));
      },
    });
    await new Promise<void>((resolve) => refusing.listen(0, '127.0.0.1', () => resolve()));
    const addr = refusing.server.address();
    process.env.SMTP_URL = `smtp://127.0.0.1:${typeof addr === 'object' && addr ? addr.port : 0}`;
    try {
      const memo = await makeMemo(analyst);
      await makeFrozenRevision(memo.id, cm);
      await addDistributionContact(cm, memo.id, { userId: samir.id });
      const release = await releaseRevision(cm, memo.id, 'A', { recipientIds: [samir.id], coverNote: 'Refused.' });
      expect(release.deliveries[0].status).toBe('failed');
      expect(release.deliveries[0].error).toContain('550');
      expect(release.id).toBeGreaterThan(0);
    } finally {
      delete process.env.SMTP_URL;
      await new Promise<void>((resolve) => refusing.close(() => resolve()));
    }
  });

  it('waits double after each failure and stops after the configured attempts', () => {
    const t0 = new Date('2026-12-02T00:00:00Z');
    const config = { retryBaseSeconds: 60, maxAttempts: 4 };
    expect([1, 2, 3].map((n) => (nextAttemptAt(n, t0, config)!.getTime() - t0.getTime()) / 1000)).toEqual([
      60, 120, 240,
    ]);
    expect(nextAttemptAt(4, t0, config)).toBeNull();
  });
});

describe('invitations', () => {
  it('an unknown address becomes an inactive customer with an invitation message; accepting activates it once', async () => {
    const memo = await makeMemo(analyst);
    const { contact, invitation } = await addDistributionContact(cm, memo.id, {
      email: 'ines.palk@northmere-basin.example',
      name: 'Ines Palk',
    });
    expect(contact).toMatchObject({ email: 'ines.palk@northmere-basin.example', state: 'invited' });
    expect(invitation).toEqual({ sent: true });
    expect(await authenticateUser('ines.palk@northmere-basin.example', 'anything-at-all')).toBeNull();
    const msg = (await messagesTo('ines.palk@northmere-basin.example')).at(-1)!;
    expect(msg.subject).toBe('Your invitation to Nodewright');
    const token = /\/invitation\/([A-Za-z0-9_.-]+)/.exec(msg.textBody ?? '')![1];
    await acceptInvitation({ token, name: 'Inès Palk', password: 'wetland-survey-2027' });
    expect(await authenticateUser('ines.palk@northmere-basin.example', 'wetland-survey-2027')).toMatchObject({
      role: 'customer',
      name: 'Inès Palk',
    });
    await expect(acceptInvitation({ token, name: 'X', password: 'another-password-1' })).rejects.toMatchObject({
      code: 'conflict',
      fields: { token: 'used' },
    });
    expect((await User.findOne({ where: { email: 'ines.palk@northmere-basin.example' } }))?.active).toBe(true);
  });
});

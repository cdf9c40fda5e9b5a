import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AccessToken, AccountMessage, AuditEvent, OutboxMessage, User } from '@/models';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';
import { startFakeSmtpServer, type RunningSmtpServer } from '@/lib/mail/start-fake-smtp-server';
import { freePort } from '../../../scripts/support/start-app-server';
import { requestPasswordReset, type ScheduleAfterResponse } from '@/lib/delivery/request-password-reset';
import { retryDueAccountMessages } from '@/lib/delivery/retry-due-account-messages';
import { sendInvitation } from '@/lib/delivery/send-invitation';
import { checkToken } from '@/lib/delivery/link-token';
import { ApiError } from '@/lib/api/errors';
import { LIMITS } from '@/lib/throttle/throttle-limits';
import type { Actor } from '@/lib/auth/permissions';

/**
 * Password-reset requests and invitation messages against the real local
 * SMTP server (npm smtp-server on loopback; nothing mocked): the work that
 * depends on the address runs only in the job scheduled after the response,
 * a new link voids the older unused ones, the per-address limit holds, and a
 * message refused by the SMTP server is retried like a delivery.
 */

let smtp: RunningSmtpServer;
const linkIn = (text: string | null, kind: string) =>
  new RegExp(`/${kind}/([A-Za-z0-9_.-]+)`).exec(text ?? '')?.[1] ?? '';
const messagesTo = async (address: string) =>
  (await OutboxMessage.findAll({ order: [['id', 'ASC']] })).filter((m) => m.envelopeTo.includes(address));

/** Collects the jobs the request schedules, to run them when the test says (after "the response"). */
function jobQueue() {
  const jobs: (() => Promise<void>)[] = [];
  const schedule: ScheduleAfterResponse = (job) => void jobs.push(job);
  const runAll = async () => {
    while (jobs.length) await jobs.shift()!();
  };
  return { schedule, runAll, jobs };
}

beforeAll(async () => {
  delete process.env.SMTP_URL;
  process.env.NEXTAUTH_URL = 'http://nodewright.test.example';
  await freshDatabase();
  smtp = await startFakeSmtpServer({ port: 0 });
});
afterAll(async () => smtp.close());

describe('password-reset request', () => {
  it('does nothing that depends on the address before the response: known and unknown addresses both only schedule a job', async () => {
    const known = await makeUser('analyst');
    const q = jobQueue();
    const counts = async () => [
      await AccountMessage.count(),
      await AccessToken.count(),
      await OutboxMessage.count(),
      await AuditEvent.count({ where: { action: 'password-reset.request' } }),
    ];
    const before = await counts();
    expect(await requestPasswordReset(known.email, '192.0.2.10', q.schedule)).toBeUndefined();
    expect(await requestPasswordReset('nobody.here@test.example', '192.0.2.10', q.schedule)).toBeUndefined();
    expect(q.jobs).toHaveLength(2);
    expect(await counts()).toEqual(before);

    await q.runAll();
    expect((await messagesTo(known.email)).map((m) => m.subject)).toEqual(['Reset your Nodewright password']);
    expect(await messagesTo('nobody.here@test.example')).toEqual([]);
    const audit = await AuditEvent.findAll({ where: { action: 'password-reset.request' }, order: [['id', 'ASC']] });
    expect(audit.map((a) => (a.details as { sent: boolean }).sent)).toEqual([true, false]);
  });

  it('a new link voids the older unused ones: of three messages only the newest link works', async () => {
    const person = await makeUser('reviewer');
    const q = jobQueue();
    for (let i = 0; i < 3; i++) await requestPasswordReset(person.email, '192.0.2.11', q.schedule);
    await q.runAll();
    const tokens = (await messagesTo(person.email)).map((m) => linkIn(m.textBody, 'password-reset'));
    expect(tokens).toHaveLength(3);
    const checks = await Promise.all(tokens.map((t) => checkToken(t, 'password-reset')));
    expect(checks.map((c) => (c.ok ? 'ok' : c.reason))).toEqual(['replaced', 'replaced', 'ok']);
  });

  it(`refuses the request after ${LIMITS.passwordResetsPerAccount.points} for one address within the window with a 429 saying when, the same for unknown addresses`, async () => {
    const person = await makeUser('analyst');
    const q = jobQueue();
    for (const email of [person.email, 'no.account@test.example']) {
      for (let i = 0; i < LIMITS.passwordResetsPerAccount.points; i++)
        await requestPasswordReset(email, `198.51.100.${i}`, q.schedule);
      const refused = await requestPasswordReset(email, '198.51.100.99', q.schedule).catch((e: unknown) => e);
      expect(refused).toBeInstanceOf(ApiError);
      expect((refused as ApiError).status).toBe(429);
      expect((refused as ApiError).message).toMatch(
        /^Too many password-reset requests for this e-mail address\. Try again after \d\d:\d\d UTC/,
      );
    }
    expect(q.jobs).toHaveLength(2 * LIMITS.passwordResetsPerAccount.points);
  });
});

describe('invitation and reset messages are retried like deliveries', () => {
  it('a message the SMTP server could not take is kept failed with the next attempt due, then sent by the retry pass with a fresh link', async () => {
    const person = await makeUser('customer');
    const cm = await makeUser('config-manager');
    const memo = await makeMemo(await makeUser('analyst'));
    const invitee = await User.create({
      email: `invitee.${Date.now()}@test.example`,
      name: 'Ines Palk',
      role: 'customer',
      passwordHash: 'x',
      active: false,
    });
    process.env.SMTP_URL = `smtp://127.0.0.1:${await freePort()}`; // nothing listens there: connection refused
    try {
      const q = jobQueue();
      await requestPasswordReset(person.email, '192.0.2.12', q.schedule);
      await q.runAll();
      const inviting: Actor & { name: string } = cm;
      expect(await sendInvitation(invitee, inviting, memo.id)).toMatchObject({ sent: false });
    } finally {
      delete process.env.SMTP_URL;
    }
    const failed = await AccountMessage.findAll({ where: { userId: [person.id, invitee.id] }, order: [['id', 'ASC']] });
    expect(failed.map((m) => [m.purpose, m.status, m.attempts])).toEqual([
      ['password-reset', 'failed', 1],
      ['invitation', 'failed', 1],
    ]);
    for (const m of failed) {
      // First retry after NODEWRIGHT_MAIL_RETRY_SECONDS (60 s by default).
      const wait = m.nextAttemptAt!.getTime() - m.lastAttemptAt!.getTime();
      expect(wait).toBeGreaterThanOrEqual(59_000);
      expect(wait).toBeLessThanOrEqual(61_000);
    }
    expect(await retryDueAccountMessages(new Date())).toEqual([]);
    expect(await retryDueAccountMessages(new Date(Date.now() + 61_000))).toEqual(failed.map((m) => m.id));
    const [reset] = await messagesTo(person.email);
    const [invitation] = await messagesTo(invitee.email);
    expect([reset.subject, invitation.subject]).toEqual([
      'Reset your Nodewright password',
      'Your invitation to Nodewright',
    ]);
    expect((await checkToken(linkIn(reset.textBody, 'password-reset'), 'password-reset')).ok).toBe(true);
    expect((await checkToken(linkIn(invitation.textBody, 'invitation'), 'invitation')).ok).toBe(true);
    const sent = await AccountMessage.findAll({ where: { userId: [person.id, invitee.id] }, order: [['id', 'ASC']] });
    expect(sent.map((m) => [m.status, m.attempts])).toEqual([
      ['delivered', 2],
      ['delivered', 2],
    ]);
  });
});

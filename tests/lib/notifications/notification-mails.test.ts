import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, Memo, Notification, OutboxMessage } from '@/models';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';
import { startFakeSmtpServer, type RunningSmtpServer } from '@/lib/mail/start-fake-smtp-server';
import { notifyTransition } from '@/lib/notifications/notify-transition';
import { attemptNotificationMail } from '@/lib/notifications/attempt-notification-mail';
import { retryDueNotificationMails } from '@/lib/notifications/retry-due-notification-mails';
import { updateNotificationSettings } from '@/lib/notifications/update-notification-settings';
import type { WorkflowNotificationKind } from '@/lib/notifications/notification-kinds';
import type { Actor } from '@/lib/auth/permissions';

/**
 * Workflow notifications against the real local SMTP server (npm
 * smtp-server on a loopback port): who is told of each transition, the
 * switch per kind, and retries with the delivery's doubling waits when the
 * server is down (connection refused, RFC 5321 offers no reply at all).
 */

let smtp: RunningSmtpServer;
let owner: Actor, coAuthor: Actor, reviewer: Actor, cm: Actor, otherAnalyst: Actor;

beforeAll(async () => {
  delete process.env.SMTP_URL;
  process.env.NEXTAUTH_URL = 'http://nodewright.test.example';
  process.env.NODEWRIGHT_MAIL_RETRY_SECONDS = '60';
  await freshDatabase();
  smtp = await startFakeSmtpServer({ port: 0 });
  [owner, coAuthor, reviewer, cm, otherAnalyst] = [
    await makeUser('analyst'),
    await makeUser('analyst'),
    await makeUser('reviewer'),
    await makeUser('config-manager'),
    await makeUser('analyst'),
  ];
});
afterAll(async () => smtp.close());

async function notify(memoId: number, kind: WorkflowNotificationKind, actor: Actor, note: string): Promise<number[]> {
  const sequelize = await db();
  return sequelize.transaction(async (transaction) =>
    notifyTransition({
      memo: await Memo.findByPk(memoId, { rejectOnEmpty: true, transaction }),
      kind,
      actorId: actor.id,
      note,
      revisionLetter: 'A',
      transaction,
    }),
  );
}
const recipientsOf = async (memoId: number, kind: string) =>
  (await Notification.findAll({ where: { memoId, kind }, order: [['userId', 'ASC']] })).map((n) => n.userId);

describe('who is told', () => {
  it('follows the audience of each kind, never the person who acted, never someone outside the memo', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewer], coAuthors: [coAuthor] });
    await notify(memo.id, 'submitted', owner, 'n');
    await notify(memo.id, 'changes-requested', reviewer, 'n');
    await notify(memo.id, 'approved', reviewer, 'n');
    await notify(memo.id, 'frozen', cm, 'n');
    await notify(memo.id, 'released', cm, 'n');
    expect(await recipientsOf(memo.id, 'submitted')).toEqual([reviewer.id]);
    expect(await recipientsOf(memo.id, 'changes-requested')).toEqual([owner.id, coAuthor.id]);
    expect(await recipientsOf(memo.id, 'approved')).toEqual([owner.id, coAuthor.id, cm.id]);
    expect(await recipientsOf(memo.id, 'frozen')).toEqual([owner.id, coAuthor.id, reviewer.id]);
    expect(await recipientsOf(memo.id, 'released')).toEqual([owner.id]);
    expect((await Notification.findAll({ where: { memoId: memo.id } })).some((n) => n.userId === otherAnalyst.id)).toBe(
      false,
    );
  });
});

describe('e-mail', () => {
  it('a kind switched off records the notification without mail; the others queue one', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewer], coAuthors: [coAuthor] });
    await updateNotificationSettings(coAuthor, { email: { frozen: false } });
    const queued = await notify(memo.id, 'frozen', cm, 'First baseline.');
    const rows = await Notification.findAll({ where: { memoId: memo.id, kind: 'frozen' }, order: [['userId', 'ASC']] });
    expect(rows.map((r) => [r.userId, r.mailStatus])).toEqual([
      [owner.id, 'queued'],
      [coAuthor.id, null],
      [reviewer.id, 'queued'],
    ]);
    expect(queued.sort()).toEqual(
      rows
        .filter((r) => r.mailStatus === 'queued')
        .map((r) => r.id)
        .sort(),
    );
  });

  it('server down: the mail fails with the error and a retry due after the base wait; the retry pass then sends it with the note', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewer] });
    const [id] = await notify(memo.id, 'submitted', owner, 'Please check the eclipse season table.');
    const port = smtp.port;
    await smtp.close();
    expect(await attemptNotificationMail(id)).toBe(true);
    const failed = await Notification.findByPk(id, { rejectOnEmpty: true });
    expect(failed.mailStatus).toBe('failed');
    expect(failed.mailError).toMatch(/ECONNREFUSED|ESOCKET|ECONNECTION/);
    expect(
      new Date(failed.mailNextAttemptAt!).getTime() - new Date(failed.mailLastAttemptAt!).getTime(),
    ).toBeGreaterThanOrEqual(59_000);

    smtp = await startFakeSmtpServer({ port });
    expect(await retryDueNotificationMails(new Date())).toEqual([]); // not due yet
    // Due now, with the mails the earlier cases queued and never sent (left behind longer than the grace minute).
    expect(await retryDueNotificationMails(new Date(Date.now() + 61_000))).toContain(id);
    const sent = await Notification.findByPk(id, { rejectOnEmpty: true });
    expect([sent.mailStatus, sent.mailAttempts, sent.mailError]).toEqual(['sent', 2, null]);
    const received = (await OutboxMessage.findAll({ order: [['id', 'ASC']] }))
      .filter((m) => m.envelopeTo.includes(reviewer.email))
      .at(-1);
    expect(received?.subject).toBe(`For your review: ${memo.documentNumber} ${memo.title}`);
    expect(received?.textBody).toContain('Please check the eclipse season table.');
    expect(received?.textBody).toContain(`http://nodewright.test.example/memos/${memo.id}`);
    // A sent mail is not sent again.
    expect(await attemptNotificationMail(id)).toBe(false);
  });
});

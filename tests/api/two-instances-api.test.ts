import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { HttpSession } from '../../scripts/support/http-session';
import { freePort, startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { CollectingSmtpServer } from '../support/collecting-smtp-server';
import { demoEmail, frozenMemo, signedIn } from '../support/delivery-flow';
import type { ReleaseRecord, RevisionDeliveries } from '@/lib/delivery/delivery-record';

/*
 * What is checked: two app instances (two `npm start` processes, as behind a
 * load balancer) on one PostgreSQL database, under `npm run test:postgres`
 * (skipped on SQLite, which serves one machine). Both send mail to an SMTP
 * server (npm smtp-server) owned by this test, so every message either
 * instance hands over is counted here; reply codes per RFC 5321 §4.2.
 *  - a session cookie issued by one instance is honoured by the other
 *    (signed JWT with the shared NEXTAUTH_SECRET, session row in the database);
 *  - a sign-out on one instance is refused by the other within 500 ms,
 *    though the other remembers open sessions for 2 s (it hears the NOTIFY
 *    the sign-out sends, lib/sessions/listen-session-changes.ts);
 *  - saves based on the same version sent to both at once: exactly one
 *    is accepted, the other answers 409 (the memo's conditional UPDATE);
 *  - a frozen revision downloads the same bytes from both;
 *  - a release made while the mail server is down is retried by the
 *    instances' retry passes once it is back: each message arrives once;
 *  - with one instance stopped, the other sends on alone, taking the
 *    retry pass over once the stopped one's lease runs out.
 */

const postgres = Boolean(process.env.NODEWRIGHT_TEST_POSTGRES_URL);
const RETRY_SECONDS = 1;

let a: AppServer | undefined;
let b: AppServer | undefined;
let smtp: CollectingSmtpServer;
let received: CollectingSmtpServer['received'] = [];

const sha = (bytes: Buffer) => crypto.createHash('sha256').update(bytes).digest('hex');
const until = async (what: string, done: () => Promise<boolean>, seconds = 60) => {
  for (let i = 0; i < seconds * 2; i++) {
    if (await done()) return;
    await new Promise((ok) => setTimeout(ok, 500));
  }
  throw new Error(`${what}: not within ${seconds} s`);
};
const deliveriesOf = async (cm: HttpSession, memoId: number) =>
  (await cm.json<{ revisions: RevisionDeliveries[] }>(`/api/memos/${memoId}/deliveries`)).body.revisions.flatMap((r) =>
    r.releases.flatMap((rel) => rel.deliveries),
  );
const countBySubjectAndRecipient = (subjectStart: string) => {
  const counts = new Map<string, number>();
  for (const m of received.filter((x) => x.subject?.startsWith(subjectStart))) {
    const to = (Array.isArray(m.to) ? m.to : [m.to]).flatMap((t) => t?.value.map((v) => v.address) ?? []).join(',');
    counts.set(`${m.subject} → ${to}`, (counts.get(`${m.subject} → ${to}`) ?? 0) + 1);
  }
  return counts;
};

beforeAll(async () => {
  if (!postgres) return;
  smtp = new CollectingSmtpServer(await freePort());
  received = smtp.received;
  const shared = {
    NEXTAUTH_SECRET: crypto.randomBytes(32).toString('base64url'),
    SMTP_URL: smtp.url,
    NODEWRIGHT_MAIL_RETRY_SECONDS: String(RETRY_SECONDS),
  };
  a = await startAppServer(shared);
  b = await startAppServer({ ...shared, DATABASE_URL: a.databaseUrl });
}, 300_000);

afterAll(async () => {
  a?.stop();
  b?.stop();
  await smtp?.stop();
});

describe.skipIf(!postgres)('two app instances on one PostgreSQL database', () => {
  let analystA: HttpSession, analystB: HttpSession, reviewerA: HttpSession, cmA: HttpSession, cmB: HttpSession;

  it('a session signed in on one instance is honoured by the other', async () => {
    [analystA, reviewerA, cmA] = await Promise.all(
      (['analyst', 'reviewer', 'config-manager'] as const).map((role) => signedIn(a!.baseUrl, role)),
    );
    analystB = analystA.copy(b!.baseUrl);
    cmB = cmA.copy(b!.baseUrl);
    expect((await analystB.json<{ user: { email: string } }>('/api/auth/session')).body.user.email).toBe(
      demoEmail('analyst'),
    );
    expect((await analystB.json('/api/memos')).status).toBe(200);
  });

  it('a sign-out on one instance is refused by the other at once, though the other had just checked that session', async () => {
    const leaving = await signedIn(a!.baseUrl, 'reviewer');
    const onB = leaving.copy(b!.baseUrl);
    // Instance B checks the session and remembers it as open (NODEWRIGHT_SESSION_RECHECK_MS, 2 s by default).
    expect((await onB.json('/api/memos')).status).toBe(200);
    expect((await onB.json('/api/memos')).status).toBe(200);
    expect(await leaving.signOut()).toBeLessThan(400);
    // B hears A's NOTIFY when the sign-out commits; 500 ms is well inside the 2 s B would otherwise wait.
    const signedOutAt = Date.now();
    let status = 200;
    while (status === 200 && Date.now() - signedOutAt < 500) status = (await onB.json('/api/memos')).status;
    expect(status, `B still served the session ${Date.now() - signedOutAt} ms after the sign-out on A`).toBe(401);
  });

  it('saves based on the same version sent to both at once: exactly one wins, the other is a 409', async () => {
    const created = await analystA.json<{ id: number; version: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Saved from two instances' }),
    });
    expect(created.status).toBe(201);
    let version = created.body.version;
    for (let round = 0; round < 8; round++) {
      const save = (s: HttpSession, who: string) =>
        s.json<{ version: number; currentVersion?: number }>(`/api/memos/${created.body.id}`, {
          method: 'PATCH',
          body: JSON.stringify({ title: `Round ${round} by ${who}`, baseVersion: version }),
        });
      const outcomes = await Promise.all([save(analystA, 'A'), save(analystB, 'B')]);
      expect(outcomes.map((o) => o.status).sort(), `round ${round}`).toEqual([200, 409]);
      const won = outcomes.find((o) => o.status === 200)!;
      expect(won.body.version).toBe(version + 1);
      expect(outcomes.find((o) => o.status === 409)!.body.currentVersion).toBe(version + 1);
      version += 1;
    }
    const versions = await analystB.json<{ versions: { versionNumber: number }[] }>(
      `/api/memos/${created.body.id}/versions?all=true`,
    );
    expect(versions.body.versions.map((v) => v.versionNumber).sort((x, y) => x - y)).toEqual(
      Array.from({ length: version }, (_, i) => i + 1),
    );
  });

  let memoId = 0;
  let pdfSha256 = '';

  it('a frozen revision downloads the same bytes from both instances', async () => {
    ({ memoId, sha256: pdfSha256 } = await frozenMemo(
      { analyst: analystA, reviewer: reviewerA, cm: cmA },
      'TERNLIGHT-1 baseline served twice',
    ));
    const fromA = await cmA.request(`/api/memos/${memoId}/revisions/A/pdf`);
    const fromB = await cmB.request(`/api/memos/${memoId}/revisions/A/pdf`);
    expect([fromA.status, fromB.status]).toEqual([200, 200]);
    const [bytesA, bytesB] = [Buffer.from(await fromA.arrayBuffer()), Buffer.from(await fromB.arrayBuffer())];
    expect(sha(bytesA)).toBe(pdfSha256);
    expect(sha(bytesB)).toBe(pdfSha256);
    expect(bytesB.equals(bytesA)).toBe(true);
    expect(fromB.headers.get('x-content-sha256')).toBe(pdfSha256);
  });

  it("a release made while the mail server is down: once it is back, each of the release's messages arrives once", async () => {
    const customer = (await cmA.json<{ users: { id: number }[] }>('/api/users?role=customer')).body.users[0].id;
    expect(
      (
        await cmA.json(`/api/memos/${memoId}/distribution`, {
          method: 'POST',
          body: JSON.stringify({ userId: customer }),
        })
      ).status,
    ).toBe(201);
    const people = ['Ines Palk', 'Oren Castell', 'Tove Marr'];
    const invited = people.map((n) => `${n.toLowerCase().replace(' ', '.')}@northmere-basin.example`);
    for (const [i, name] of people.entries()) {
      const via = i % 2 === 0 ? cmA : cmB;
      expect(
        (
          await via.json(`/api/memos/${memoId}/distribution`, {
            method: 'POST',
            body: JSON.stringify({ email: invited[i], name }),
          })
        ).status,
      ).toBe(201);
    }
    const res = await cmB.json<ReleaseRecord>(`/api/memos/${memoId}/revisions/A/releases`, {
      method: 'POST',
      body: JSON.stringify({ recipientIds: 'all', coverNote: 'Released while the mail server was down.' }),
    });
    expect(res.status).toBe(201);
    expect(res.body.deliveries.map((d) => d.status)).toEqual(['failed', 'failed', 'failed', 'failed']);
    expect(received).toHaveLength(0);

    await smtp.start();
    await until('every delivery delivered', async () =>
      (await deliveriesOf(cmA, memoId)).every((d) => d.status === 'delivered'),
    );
    await until('every invitation received', async () =>
      invited.every((e) =>
        received.some((m) => m.subject === 'Your invitation to Nodewright' && JSON.stringify(m.to).includes(e)),
      ),
    );
    // Several more retry periods in which both instances run their timers: nothing arrives a second time.
    await new Promise((ok) => setTimeout(ok, 6 * RETRY_SECONDS * 1000));

    const notices = countBySubjectAndRecipient('Revision A of');
    expect([...notices.keys()].sort()).toEqual(
      [demoEmail('customer'), ...invited]
        .map((e) => `${received.find((m) => m.subject?.startsWith('Revision A of'))!.subject} → ${e}`)
        .sort(),
    );
    expect([...notices.values()]).toEqual([1, 1, 1, 1]);
    expect([...countBySubjectAndRecipient('Your invitation to Nodewright').values()]).toEqual([1, 1, 1]);
    for (const [message, n] of countBySubjectAndRecipient('')) expect(n, message).toBe(1);
  }, 120_000);

  it('with one instance stopped, the other sends on alone (taking the retry lease over when the stopped one held it)', async () => {
    a!.stop();
    a = undefined;
    await smtp.stop();
    const before = received.length;
    const res = await cmB.json<ReleaseRecord>(`/api/memos/${memoId}/revisions/A/releases`, {
      method: 'POST',
      body: JSON.stringify({ recipientIds: 'all', coverNote: 'Second notice, sent by the remaining instance.' }),
    });
    expect(res.status).toBe(201);
    expect(res.body.deliveries.every((d) => d.status === 'failed')).toBe(true);
    await smtp.start();
    await until('the second release delivered by instance B', async () =>
      (await deliveriesOf(cmB, memoId)).every((d) => d.status === 'delivered'),
    );
    const second = received
      .slice(before)
      .filter(
        (m) =>
          m.subject?.startsWith('Revision A of') && m.text?.includes('Second notice, sent by the remaining instance.'),
      );
    expect(second).toHaveLength(4);
    expect(new Set(second.map((m) => JSON.stringify(m.to))).size).toBe(4);
  }, 120_000);
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { demoEmail, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import { LIMITS } from '@/lib/throttle/throttle-limits';
import type { OutboxDetail, OutboxSummary } from '@/lib/mail/list-outbox-messages';

/**
 * Throttling over HTTP against a real app instance of this file's own (the
 * blocks it causes must not reach other files' sign-ins), on loopback. The
 * instance trusts one proxy hop (NODEWRIGHT_TRUSTED_PROXY_HOPS=1), so each
 * request can name its client address in X-Forwarded-For, as a proxy would.
 * Loops are bounded; nothing here asserts a time.
 */

let app: AppServer;
let baseUrl = '';
let admin: HttpSession;
let run = 0;

beforeAll(async () => {
  app = await startAppServer({ NODEWRIGHT_TRUSTED_PROXY_HOPS: '1' });
  baseUrl = app.baseUrl;
  admin = await signedIn(baseUrl, 'admin');
}, 300_000);
afterAll(() => app?.stop());

/** One sign-in attempt through next-auth's credentials flow from `address`; the error next-auth passes to the sign-in page. */
async function trySignIn(
  email: string,
  password: string,
  address: string,
): Promise<{ signedIn: boolean; error: string | null }> {
  const s = new HttpSession(baseUrl);
  const from = { 'x-forwarded-for': address };
  const csrf = await s.json<{ csrfToken: string }>('/api/auth/csrf', { headers: from });
  const form = new URLSearchParams({
    csrfToken: csrf.body.csrfToken,
    email,
    password,
    json: 'true',
    callbackUrl: `${baseUrl}/memos`,
  });
  const res = await s.json<{ url: string }>('/api/auth/callback/credentials', {
    method: 'POST',
    body: form,
    headers: { 'content-type': 'application/x-www-form-urlencoded', ...from },
  });
  const error = new URL(res.body.url, baseUrl).searchParams.get('error');
  return { signedIn: (await s.json<{ user?: unknown }>('/api/auth/session')).body?.user !== undefined, error };
}

const resetRequest = (email: string, address: string) =>
  fetch(`${baseUrl}/api/password-resets`, {
    method: 'POST',
    body: JSON.stringify({ email }),
    headers: { 'content-type': 'application/json', 'x-forwarded-for': address },
  });

async function newPerson(): Promise<{ id: number; email: string; password: string }> {
  const email = `throttle.${Date.now()}.${++run}@brightwater.example`;
  const password = 'first-password-26';
  const res = await admin.json<{ id: number }>('/api/users', {
    method: 'POST',
    body: JSON.stringify({ email, name: `Throttle Test ${run}`, role: 'analyst', password }),
  });
  expect(res.status).toBe(201);
  return { id: res.body.id, email, password };
}

const outboxFor = async (email: string) =>
  (await admin.json<{ messages: OutboxSummary[] }>(`/api/outbox?to=${encodeURIComponent(email)}`)).body.messages;

describe('wrong passwords', () => {
  const perAccount = LIMITS.passwordFailuresPerAccount.points;
  const perAddress = LIMITS.passwordFailuresPerAddress.points;

  it(`610 wrong passwords in a loop for one account: refused from attempt ${perAccount + 1} on, with when to try again; the right password too; other accounts unaffected`, async () => {
    const analyst = demoEmail('analyst');
    let refusedAt = -1;
    let refusal: string | null = null;
    for (let i = 0; i < 610; i++) {
      const r = await trySignIn(analyst, `wrong-password-${i}`, `192.0.2.${i % 200}`);
      expect(r.signedIn).toBe(false);
      if (r.error !== 'CredentialsSignin') {
        refusedAt = i;
        refusal = r.error;
        break;
      }
    }
    expect(refusedAt).toBe(perAccount);
    expect(refusal).toMatch(
      /^Too many wrong passwords for this account\. Try again after \d\d:\d\d UTC \(in about 15 minutes\)\.$/,
    );
    const right = await trySignIn(analyst, DEMO_PASSWORD, '198.51.100.1');
    expect(right).toEqual({ signedIn: false, error: refusal });
    expect((await trySignIn(demoEmail('reviewer'), DEMO_PASSWORD, '198.51.100.1')).signedIn).toBe(true);
  });

  it(`${perAddress} wrong passwords from one address for any accounts: that address is refused, others are not`, async () => {
    const address = '203.0.113.66';
    for (let i = 0; i < perAddress; i++)
      expect((await trySignIn(`nobody.${i}@northmere-basin.example`, 'guess-guess', address)).error).toBe(
        'CredentialsSignin',
      );
    const refused = await trySignIn(demoEmail('config-manager'), DEMO_PASSWORD, address);
    expect(refused.signedIn).toBe(false);
    expect(refused.error).toMatch(/^Too many wrong passwords from your network address\. Try again after/);
    expect((await trySignIn(demoEmail('config-manager'), DEMO_PASSWORD, '203.0.113.67')).signedIn).toBe(true);
  });
});

describe('password-reset requests', () => {
  it('known and unknown addresses get the same status and body', async () => {
    const person = await newPerson();
    const known = await resetRequest(person.email, '192.0.2.201');
    const unknown = await resetRequest('no.such.person@brightwater.example', '192.0.2.202');
    expect([known.status, await known.text(), known.headers.get('content-type')]).toEqual([
      unknown.status,
      await unknown.text(),
      unknown.headers.get('content-type'),
    ]);
    expect(known.status).toBe(202);
  });

  it(`333 requests in a burst for one account: ${LIMITS.passwordResetsPerAccount.points} accepted, at most that many mails, only the newest link works, and using it ends the person’s sessions`, async () => {
    const person = await newPerson();
    const session = new HttpSession(baseUrl);
    expect(await session.signIn(person.email, person.password)).toBe(true);
    const statuses = await Promise.all(
      Array.from({ length: 333 }, (_, i) =>
        resetRequest(person.email, `10.${Math.floor(i / 250)}.${i % 250}.1`).then(
          async (r) => [r.status, await r.json()] as const,
        ),
      ),
    );
    const accepted = statuses.filter(([s]) => s === 202);
    const refused = statuses.filter(([s]) => s === 429);
    expect(accepted).toHaveLength(LIMITS.passwordResetsPerAccount.points);
    expect(refused).toHaveLength(333 - LIMITS.passwordResetsPerAccount.points);
    expect((refused[0][1] as { error: string }).error).toMatch(
      /^Too many password-reset requests for this e-mail address\. Try again after/,
    );

    // The mails go out after the responses; wait (bounded) until they are in the outbox.
    let messages: OutboxSummary[] = [];
    for (let i = 0; i < 40 && messages.length < accepted.length; i++) {
      await new Promise((r) => setTimeout(r, 250));
      messages = await outboxFor(person.email);
    }
    expect(messages.length).toBeLessThanOrEqual(LIMITS.passwordResetsPerAccount.points);
    expect(messages.length).toBe(accepted.length);
    const tokens: string[] = [];
    for (const m of messages) {
      const detail = await admin.json<OutboxDetail>(`/api/outbox/${m.id}`);
      tokens.push(/\/password-reset\/([A-Za-z0-9_.-]+)/.exec(detail.body.text ?? '')![1]);
    }
    const outcomes = [];
    for (const token of tokens) {
      const res = await fetch(`${baseUrl}/api/password-resets/complete`, {
        method: 'POST',
        body: JSON.stringify({ token, password: 'reset-password-26' }),
        headers: { 'content-type': 'application/json' },
      });
      const body = (await res.json()) as { fields?: { token?: string } };
      outcomes.push(res.status === 200 ? 'set' : `${res.status} ${body.fields?.token}`);
    }
    expect(outcomes.filter((o) => o === 'set')).toHaveLength(1);
    expect(outcomes.filter((o) => o !== 'set')).toEqual(Array(tokens.length - 1).fill('409 replaced'));
    expect((await session.json('/api/notifications')).status).toBe(401);
    expect((await trySignIn(person.email, 'reset-password-26', '192.0.2.203')).signedIn).toBe(true);
  });

  it(`${LIMITS.passwordResetsPerAddress.points} requests from one address for any addresses, then 429`, async () => {
    const address = '198.51.100.150';
    for (let i = 0; i < LIMITS.passwordResetsPerAddress.points; i++)
      expect((await resetRequest(`someone.${i}@northmere-basin.example`, address)).status).toBe(202);
    const refused = await resetRequest('one.more@northmere-basin.example', address);
    expect(refused.status).toBe(429);
    expect(((await refused.json()) as { error: string }).error).toMatch(
      /^Too many password-reset requests from your network address\. Try again after/,
    );
    expect((await resetRequest('one.more@northmere-basin.example', '198.51.100.151')).status).toBe(202);
  });
});

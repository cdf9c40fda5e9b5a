import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { demoEmail } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

/**
 * Session revocation over HTTP against the real server: a session cookie
 * kept after sign-out, a password change or "sign out everywhere" gets 401
 * (README "Sessions"). People are created for this file, so the demo
 * accounts other files sign in with are untouched.
 */

let admin: HttpSession;
let run = 0;

async function signedInAs(email: string, password: string): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(email, password), `sign in as ${email}`).toBe(true);
  return s;
}

async function newPerson(
  role: Role,
  password = 'first-password-26',
): Promise<{ id: number; email: string; password: string }> {
  const email = `session.test.${Date.now()}.${++run}@brightwater.example`;
  const res = await admin.json<{ id: number }>('/api/users', {
    method: 'POST',
    body: JSON.stringify({ email, name: `Session Test ${run}`, role, password }),
  });
  expect(res.status).toBe(201);
  return { id: res.body.id, email, password };
}

const status = async (s: HttpSession) => (await s.json('/api/notifications')).status;

beforeAll(async () => {
  admin = await signedInAs(demoEmail('admin'), DEMO_PASSWORD);
});

describe('sessions end', () => {
  it('at sign-out: the old cookie replayed afterwards gets 401, another browser of the same person stays signed in', async () => {
    const person = await newPerson('analyst');
    const browser = await signedInAs(person.email, person.password);
    const otherBrowser = await signedInAs(person.email, person.password);
    const kept = browser.copy();
    expect(await status(kept)).toBe(200);
    expect(await browser.signOut()).toBe(200);
    expect(await status(kept)).toBe(401);
    expect((await kept.json('/api/memos')).status).toBe(401);
    // next-auth's own session endpoint knows it too: no user, and the cookie is cleared.
    const ended = await kept.request('/api/auth/session');
    expect(await ended.json()).toEqual({});
    expect(ended.headers.getSetCookie().some((c) => /next-auth\.session-token=;/.test(c))).toBe(true);
    expect(await status(otherBrowser)).toBe(200);
  });

  it('when an administrator sets a new password: every session of that person gets 401', async () => {
    const person = await newPerson('reviewer');
    const a = await signedInAs(person.email, person.password);
    const b = await signedInAs(person.email, person.password);
    const change = await admin.json(`/api/users/${person.id}`, {
      method: 'PATCH',
      body: JSON.stringify({ password: 'second-password-26' }),
    });
    expect(change.status).toBe(200);
    expect([await status(a), await status(b)]).toEqual([401, 401]);
    expect(await status(await signedInAs(person.email, 'second-password-26'))).toBe(200);
  });

  it('when administrators change their own password: their other sessions end, the browser that changed it stays', async () => {
    const second = await newPerson('admin');
    const here = await signedInAs(second.email, second.password);
    const elsewhere = await signedInAs(second.email, second.password);
    const change = await here.json(`/api/users/${second.id}`, {
      method: 'PATCH',
      body: JSON.stringify({ password: 'second-password-26' }),
    });
    expect(change.status).toBe(200);
    expect(await status(elsewhere)).toBe(401);
    expect(await status(here)).toBe(200);
  });

  it('"sign out everywhere" ends every session of the person (admin only)', async () => {
    const person = await newPerson('config-manager');
    const sessions = [await signedInAs(person.email, person.password), await signedInAs(person.email, person.password)];
    const notAdmin = await signedInAs(person.email, person.password);
    expect((await notAdmin.json(`/api/users/${person.id}/sessions`, { method: 'DELETE' })).status).toBe(403);
    const ended = await admin.json<{ userId: number; sessionsEnded: number }>(`/api/users/${person.id}/sessions`, {
      method: 'DELETE',
    });
    expect(ended).toEqual({ status: 200, body: { userId: person.id, sessionsEnded: 3 } });
    expect(await Promise.all([...sessions, notAdmin].map(status))).toEqual([401, 401, 401]);
    expect((await admin.json('/api/users/999999/sessions', { method: 'DELETE' })).status).toBe(404);
    expect((await admin.json('/api/users/x/sessions', { method: 'DELETE' })).status).toBe(400);
    // Signing in again works; the audit trail names the administrator.
    expect(await status(await signedInAs(person.email, person.password))).toBe(200);
    const audit = await admin.json<{ events: { action: string; details: { userId?: number } }[] }>(
      '/api/audit?action=sessions.end',
    );
    expect(audit.body.events.some((e) => e.details.userId === person.id)).toBe(true);
  });

  it('a deactivated person’s sessions stay ended after reactivation', async () => {
    const person = await newPerson('analyst');
    const s = await signedInAs(person.email, person.password);
    expect(
      (await admin.json(`/api/users/${person.id}`, { method: 'PATCH', body: JSON.stringify({ active: false }) }))
        .status,
    ).toBe(200);
    expect(
      (await admin.json(`/api/users/${person.id}`, { method: 'PATCH', body: JSON.stringify({ active: true }) })).status,
    ).toBe(200);
    expect(await status(s)).toBe(401);
  });
});

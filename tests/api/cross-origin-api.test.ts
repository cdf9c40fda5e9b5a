import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

/**
 * Cross-site request forgery (issue 11, item 1) over HTTP against the real
 * server: a state-changing request whose Origin (or Referer) is not the app's
 * own is refused with 403 and changes nothing; JSON routes take only
 * application/json. The forged origin is the same host on another port — the
 * same site for the browser, so its cookies would travel with the request.
 */

const baseUrl = inject('baseUrl');
const otherOrigin = `http://127.0.0.1:${Number(new URL(baseUrl).port) + 1}`;
const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;

async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

let admin: HttpSession;
let analyst: HttpSession;

beforeAll(async () => {
  admin = await as('admin');
  analyst = await as('analyst');
});

const userEmails = async () =>
  (await admin.json<{ users: { email: string }[] }>('/api/users')).body.users.map((u) => u.email);
const memoTitles = async () =>
  (await analyst.json<{ memos: { title: string }[] }>('/api/memos')).body.memos.map((m) => m.title);

describe('state-changing API requests from another origin', () => {
  it('POST /api/users with an admin cookie and Origin of another port: 403 in the error shape, no account created', async () => {
    const email = 'forged.admin@elsewhere.example';
    const body = JSON.stringify({ email, name: 'Forged Admin', role: 'admin', password: 'forged-password-1' });
    const forgeries: Record<string, string>[] = [
      { origin: otherOrigin },
      { origin: 'null' },
      { origin: otherOrigin, 'content-type': 'text/plain' },
    ];
    for (const headers of forgeries) {
      const res = await admin.json<{ error: string; code: string; reason: string }>('/api/users', {
        method: 'POST',
        body,
        headers,
      });
      expect(res.status, JSON.stringify(headers)).toBe(403);
      expect(res.body.code).toBe('forbidden');
      expect(res.body.reason).toBe('cross_origin');
      expect(res.body.error).toMatch(/another site/);
    }
    expect(await userEmails()).not.toContain(email);
  });

  it('POST /api/memos with an analyst cookie: a foreign Origin or Referer is refused, nothing created', async () => {
    const title = 'Forged memo from another origin';
    const body = JSON.stringify({ title });
    const byOrigin = await analyst.json<{ code: string }>('/api/memos', {
      method: 'POST',
      body,
      headers: { origin: otherOrigin },
    });
    expect(byOrigin.status).toBe(403);
    const byReferer = await analyst.json<{ code: string }>('/api/memos', {
      method: 'POST',
      body,
      headers: { referer: `${otherOrigin}/attack.html` },
    });
    expect(byReferer.status).toBe(403);
    expect(await memoTitles()).not.toContain(title);
  });

  it('PATCH and DELETE are guarded too', async () => {
    const patch = await admin.json('/api/users/1', {
      method: 'PATCH',
      body: JSON.stringify({ name: 'Renamed by a forgery' }),
      headers: { origin: otherOrigin },
    });
    expect(patch.status).toBe(403);
    const del = await analyst.json('/api/memos/1/distribution/1', {
      method: 'DELETE',
      headers: { origin: otherOrigin },
    });
    expect(del.status).toBe(403);
  });

  it('the same request from the app’s own origin, or from a script that sends neither Origin nor Referer, is accepted', async () => {
    const own = await analyst.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Own-origin memo' }),
      headers: { origin: baseUrl },
    });
    expect(own.status).toBe(201);
    const ownReferer = await analyst.json('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Own-referer memo' }),
      headers: { referer: `${baseUrl}/memos/new` },
    });
    expect(ownReferer.status).toBe(201);
    const script = await analyst.json('/api/memos', { method: 'POST', body: JSON.stringify({ title: 'Script memo' }) });
    expect(script.status).toBe(201);
    expect(await memoTitles()).toEqual(expect.arrayContaining(['Own-origin memo', 'Own-referer memo', 'Script memo']));
  });

  it('GET is not a change and is not refused for its Origin', async () => {
    expect((await analyst.json('/api/memos', { headers: { origin: otherOrigin } })).status).toBe(200);
  });
});

describe('content types', () => {
  it('a text/plain body on a JSON route is refused (415 naming application/json), even from no origin, and creates nothing', async () => {
    const title = 'Memo sent as text/plain';
    const res = await analyst.json<{ error: string; code: string; fields: Record<string, string> }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title }),
      headers: { 'content-type': 'text/plain' },
    });
    expect(res.status).toBe(403); // no Origin + a form content type: the CSRF rule refuses it first
    const sameOrigin = await analyst.json<{ error: string; code: string; fields: Record<string, string> }>(
      '/api/memos',
      {
        method: 'POST',
        body: JSON.stringify({ title }),
        headers: { 'content-type': 'text/plain', origin: baseUrl },
      },
    );
    expect(sameOrigin.status).toBe(415);
    expect(sameOrigin.body.code).toBe('unsupported_media_type');
    expect(sameOrigin.body.error).toMatch(/application\/json/);
    expect(sameOrigin.body.fields['content-type']).toMatch(/application\/json/);
    const formEncoded = await admin.json('/api/users', {
      method: 'POST',
      body: new URLSearchParams({
        email: 'form.admin@elsewhere.example',
        name: 'Form Admin',
        role: 'admin',
        password: 'form-password-1',
      }),
      headers: { origin: baseUrl },
    });
    expect(formEncoded.status).toBe(415);
    expect(await memoTitles()).not.toContain(title);
    expect(await userEmails()).not.toContain('form.admin@elsewhere.example');
  });

  it('the upload route takes only multipart/form-data', async () => {
    const memos = (await analyst.json<{ memos: { id: number; status: string }[] }>('/api/memos')).body.memos;
    const draft = memos.find((m) => m.status === 'draft')!;
    const res = await analyst.json<{ error: string }>(`/api/memos/${draft.id}/attachments`, {
      method: 'POST',
      body: JSON.stringify({ file: 'x' }),
      headers: { origin: baseUrl },
    });
    expect(res.status).toBe(415);
    expect(res.body.error).toMatch(/multipart\/form-data/);
  });

  it('next-auth keeps its own CSRF token: sign-in through the credentials flow still works, and a sign-in without the token does not', async () => {
    expect(await new HttpSession(baseUrl).signIn(demoEmail('reviewer'), DEMO_PASSWORD)).toBe(true);
    const noToken = new HttpSession(baseUrl);
    const form = new URLSearchParams({ email: demoEmail('reviewer'), password: DEMO_PASSWORD, json: 'true' });
    await noToken.request('/api/auth/callback/credentials', {
      method: 'POST',
      body: form,
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
    });
    expect((await noToken.json('/api/memos')).status).toBe(401);
  });
});

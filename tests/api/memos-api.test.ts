import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { DEMO_MEMO } from '@/lib/demo/demo-memo';
import type { Role } from '@/lib/auth/roles';

const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;

async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

type MemoBody = {
  id: number;
  version: number;
  title: string;
  documentNumber: string;
  content: unknown;
  status: string;
};

let analyst: HttpSession;
let demoMemoId: number;

beforeAll(async () => {
  analyst = await as('analyst');
  const list = await analyst.json<{ memos: MemoBody[] }>('/api/memos');
  demoMemoId = list.body.memos.find((m) => m.documentNumber === DEMO_MEMO.documentNumber)!.id;
});

describe('memos API over HTTP (real server, real sign-in)', () => {
  it('401 without a session', async () => {
    const anon = new HttpSession(inject('baseUrl'));
    expect((await anon.json('/api/memos')).status).toBe(401);
    expect((await anon.json(`/api/memos/${demoMemoId}`)).status).toBe(401);
    expect((await anon.json('/api/calc', { method: 'POST', body: '{}' })).status).toBe(401);
  });

  it('a wrong password gives no session', async () => {
    expect(await new HttpSession(inject('baseUrl')).signIn(demoEmail('analyst'), 'not-the-password')).toBe(false);
  });

  it('400 with field messages for bad input, never a 500', async () => {
    const empty = await analyst.json<{ fields: Record<string, string> }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: '   ' }),
    });
    expect(empty.status).toBe(400);
    expect(empty.body.fields.title).toBe('title is required');
    const extra = await analyst.json<{ fields: Record<string, string> }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'x', colour: 'red' }),
    });
    expect(extra.status).toBe(400);
    const notJson = await analyst.json<{ error: string }>('/api/memos', { method: 'POST', body: '{title' });
    expect(notJson.status).toBe(400);
    expect(notJson.body.error).toMatch(/not valid JSON/);
    expect((await analyst.json('/api/memos/abc')).status).toBe(400);
    expect((await analyst.json('/api/memos?status=lost')).status).toBe(400);
    const noBase = await analyst.json<{ fields: Record<string, string> }>(`/api/memos/${demoMemoId}`, {
      method: 'PATCH',
      body: JSON.stringify({ title: 'x' }),
    });
    expect(noBase.status).toBe(400);
    expect(Object.keys(noBase.body.fields)).toContain('baseVersion');
  });

  it('404 for an unknown memo', async () => {
    expect((await analyst.json('/api/memos/999999')).status).toBe(404);
  });

  it('creates a memo (201), saves it, and refuses a stale save with 409 while keeping the first save', async () => {
    const created = await analyst.json<MemoBody>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Conflict trial' }),
    });
    expect(created.status).toBe(201);
    expect(created.body.documentNumber).toMatch(/^DM-\d{4}-\d{3}$/);
    const id = created.body.id;
    const doc = (t: string) => ({
      type: 'doc',
      content: [{ type: 'paragraph', content: [{ type: 'text', text: t }] }],
    });
    const first = await analyst.json<MemoBody>(`/api/memos/${id}`, {
      method: 'PATCH',
      body: JSON.stringify({ content: doc('first'), baseVersion: 1 }),
    });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(2);
    const stale = await analyst.json<{ currentVersion: number; error: string }>(`/api/memos/${id}`, {
      method: 'PATCH',
      body: JSON.stringify({ content: doc('stale'), baseVersion: 1 }),
    });
    expect(stale.status).toBe(409);
    expect(stale.body.currentVersion).toBe(2);
    const now = await analyst.json<MemoBody>(`/api/memos/${id}`);
    expect(now.body.content).toEqual(doc('first'));
    // Every save is stored (all=true lists each); the history groups the two quick saves into one editing session.
    const versions = await analyst.json<{ versions: { versionNumber: number }[] }>(
      `/api/memos/${id}/versions?all=true`,
    );
    expect(versions.body.versions.map((v) => v.versionNumber)).toEqual([2, 1]);
    const history = await analyst.json<{ versions: { versionNumber: number; firstVersionNumber: number }[] }>(
      `/api/memos/${id}/versions`,
    );
    expect(history.body.versions.map((v) => [v.versionNumber, v.firstVersionNumber])).toEqual([[2, 1]]);
  });

  it('roles: reviewer reads the assigned memo but may not edit (403); customer sees no drafts; analysts only create', async () => {
    const reviewer = await as('reviewer');
    expect((await reviewer.json(`/api/memos/${demoMemoId}`)).status).toBe(200);
    expect(
      (
        await reviewer.json(`/api/memos/${demoMemoId}`, {
          method: 'PATCH',
          body: JSON.stringify({ title: 'x', baseVersion: 1 }),
        })
      ).status,
    ).toBe(403);
    expect((await reviewer.json('/api/memos', { method: 'POST', body: JSON.stringify({ title: 'x' }) })).status).toBe(
      403,
    );

    const customer = await as('customer');
    const list = await customer.json<{ memos: unknown[] }>('/api/memos');
    expect(list.status).toBe(200);
    expect(list.body.memos).toEqual([]);
    // A draft is hidden from customers: 404, as for an unknown memo.
    expect((await customer.json(`/api/memos/${demoMemoId}`)).status).toBe(404);
    expect((await customer.json(`/api/memos/${demoMemoId}/versions`)).status).toBe(404);

    const cm = await as('config-manager');
    expect((await cm.json('/api/memos', { method: 'POST', body: JSON.stringify({ title: 'x' }) })).status).toBe(403);
  });
});

describe('users API', () => {
  it('staff see a directory (id, name, role); admins see all fields; customers are refused', async () => {
    const dir = await analyst.json<{ users: Record<string, unknown>[] }>('/api/users?role=reviewer');
    expect(dir.status).toBe(200);
    expect(dir.body.users.length).toBeGreaterThan(0);
    for (const u of dir.body.users) {
      expect(Object.keys(u).sort()).toEqual(['id', 'name', 'role']);
      expect(u.role).toBe('reviewer');
    }
    const admin = await as('admin');
    const all = await admin.json<{ users: Record<string, unknown>[] }>('/api/users');
    // Every demo account is listed (other test files may have added people to this server).
    expect(all.body.users.map((u) => u.email)).toEqual(expect.arrayContaining(DEMO_USERS.map((u) => u.email)));
    expect(all.body.users[0]).toHaveProperty('email');
    expect(all.body.users[0]).not.toHaveProperty('passwordHash');
    expect((await (await as('customer')).json('/api/users')).status).toBe(403);
    expect((await analyst.json('/api/users?role=pilot')).status).toBe(400);
  });

  it('only admins add and change users; a deactivated user loses access at once', async () => {
    const admin = await as('admin');
    expect(
      (
        await analyst.json('/api/users', {
          method: 'POST',
          body: JSON.stringify({ email: 'x@y.example', name: 'X', role: 'analyst', password: 'long-enough-pw' }),
        })
      ).status,
    ).toBe(403);
    const bad = await admin.json<{ fields: Record<string, string> }>('/api/users', {
      method: 'POST',
      body: JSON.stringify({ email: 'nope', name: '', role: 'pilot', password: 'short' }),
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields).sort()).toEqual(['email', 'name', 'password', 'role']);

    const made = await admin.json<{ id: number }>('/api/users', {
      method: 'POST',
      body: JSON.stringify({
        email: 'wren.talbot@brightwater.example',
        name: 'Wren Talbot',
        role: 'analyst',
        password: 'wren-password-1',
      }),
    });
    expect(made.status).toBe(201);
    const dup = await admin.json('/api/users', {
      method: 'POST',
      body: JSON.stringify({
        email: 'wren.talbot@brightwater.example',
        name: 'Wren T',
        role: 'analyst',
        password: 'wren-password-1',
      }),
    });
    expect(dup.status).toBe(409);

    const wren = new HttpSession(inject('baseUrl'));
    expect(await wren.signIn('wren.talbot@brightwater.example', 'wren-password-1')).toBe(true);
    expect((await wren.json('/api/memos')).status).toBe(200);
    const off = await admin.json<{ active: boolean }>(`/api/users/${made.body.id}`, {
      method: 'PATCH',
      body: JSON.stringify({ active: false }),
    });
    expect(off.body.active).toBe(false);
    expect((await wren.json('/api/memos')).status).toBe(401);
    expect(await new HttpSession(inject('baseUrl')).signIn('wren.talbot@brightwater.example', 'wren-password-1')).toBe(
      false,
    );
  });
});

import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';
import type { MemoVersionSummary } from '@/lib/memos/memo-record';
import type { TiptapDoc } from '@/lib/memos/memo-schema';

/**
 * The version history over HTTP against the real server: quick saves by one
 * analyst are one editing session in `GET /api/memos/:id/versions` (every
 * save still listed with `all=true`); an author names a version through
 * `POST …/versions/:version/label`, which ends the session, is audited in
 * words, and refuses bad names with a 400 naming `label`; several namings at
 * once all land (no 5xx); a restore stands as an entry of its own.
 */

const demo = (role: Role) => DEMO_USERS.find((u) => u.role === role)!;
const doc = (text: string): TiptapDoc => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});
const post = (body: unknown) => ({ method: 'POST', body: JSON.stringify(body) });
type ErrorBody = { error: string; code: string; fields?: Record<string, string> };

async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(demo(role).email, DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

let analyst: HttpSession;
let memoId: number;
let version = 1;

async function save(text: string, extra: Record<string, unknown> = {}): Promise<number> {
  const res = await analyst.json<{ version: number }>(`/api/memos/${memoId}`, {
    method: 'PATCH',
    body: JSON.stringify({ content: doc(text), baseVersion: version, ...extra }),
  });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  version = res.body.version;
  return version;
}
const history = async (query = '') =>
  (await analyst.json<{ versions: MemoVersionSummary[] }>(`/api/memos/${memoId}/versions${query}`)).body.versions;

beforeAll(async () => {
  analyst = await as('analyst');
  const created = await analyst.json<{ id: number }>('/api/memos', post({ title: 'Version history under test' }));
  expect(created.status).toBe(201);
  memoId = created.body.id;
});

describe('version history API', () => {
  it('twelve quick saves are one editing session; all=true lists every save', async () => {
    for (let i = 1; i <= 12; i++) await save(`autosave ${i}`);
    const [session, ...rest] = await history();
    expect(rest).toEqual([]);
    expect(session).toMatchObject({
      versionNumber: 13,
      firstVersionNumber: 1,
      saveCount: 13,
      label: null,
      restoredFrom: null,
      author: { name: demo('analyst').name },
    });
    expect(Date.parse(session.startedAt)).toBeLessThanOrEqual(Date.parse(session.createdAt));
    expect((await history('?all=true')).map((v) => v.versionNumber)).toEqual(
      Array.from({ length: 13 }, (_, i) => 13 - i),
    );
    const bad = await analyst.json<ErrorBody>(`/api/memos/${memoId}/versions?all=yes`);
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ all: 'all must be true or false' });
  });

  it('naming the current version: 201, shown on its session, audited; later saves start a new session', async () => {
    const named = await analyst.json<{ versionNumber: number; label: string }>(
      `/api/memos/${memoId}/versions/13/label`,
      post({ label: 'Checkpoint: before review' }),
    );
    expect(named.status).toBe(201);
    expect(named.body).toMatchObject({ versionNumber: 13, label: 'Checkpoint: before review' });
    expect((await history()).map((h) => [h.versionNumber, h.firstVersionNumber, h.label])).toEqual([
      [13, 1, 'Checkpoint: before review'],
    ]);
    await save('after the checkpoint');
    await save('and more');
    expect((await history()).map((h) => [h.versionNumber, h.firstVersionNumber, h.saveCount, h.label])).toEqual([
      [15, 14, 2, null],
      [13, 1, 13, 'Checkpoint: before review'],
    ]);
    const admin = await as('admin');
    const audit = await admin.json<{ events: { action: string; summary: string }[] }>(
      `/api/audit?memoId=${memoId}&action=memo.name-version`,
    );
    expect(audit.body.events.map((e) => e.summary)).toEqual([
      expect.stringMatching(/ named version 13 of .+: “Checkpoint: before review”\.$/),
    ]);
  });

  it('refuses bad names with 400 naming label, unknown versions with 404, non-authors with 403', async () => {
    const label = async (body: unknown, v = 13) =>
      analyst.json<ErrorBody>(`/api/memos/${memoId}/versions/${v}/label`, post(body));
    for (const [body, says] of [
      [{ label: '' }, 'label must not be empty'],
      [{ label: 'x'.repeat(81) }, 'label must have at most 80 characters'],
      [{ label: 'line one\nline two' }, 'label must be one line of text, without line breaks or control characters'],
      [{}, 'label is required: the name to give this version'],
      [{ label: 42 }, 'label is required: the name to give this version'],
    ] as const) {
      const res = await label(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.fields, JSON.stringify(body)).toEqual({ label: says });
    }
    expect((await label({ label: 'x', colour: 'red' })).status).toBe(400);
    const missing = await label({ label: 'Nine hundred' }, 900);
    expect(missing.status).toBe(404);
    expect(missing.body.error).toMatch(/Version 900 of memo/);
    const badVersion = await analyst.json<ErrorBody>(`/api/memos/${memoId}/versions/v1/label`, post({ label: 'x' }));
    expect(badVersion.status).toBe(400);
    const cm = await as('config-manager');
    const refused = await cm.json<ErrorBody>(`/api/memos/${memoId}/versions/13/label`, post({ label: 'Mine' }));
    expect(refused.status).toBe(403);
    expect(refused.body.error).toBe('Only the memo’s authors name its versions.');
  });

  it('eight namings of one version at once all succeed (no 5xx); one of them is the name', async () => {
    const labels = Array.from({ length: 8 }, (_, i) => `Checkpoint ${i + 1}`);
    const results = await Promise.all(
      labels.map((l) => analyst.json<{ label: string }>(`/api/memos/${memoId}/versions/15/label`, post({ label: l }))),
    );
    expect(results.map((r) => r.status)).toEqual(labels.map(() => 201));
    expect(labels).toContain((await history())[0].label);
  });

  it('a restore is an entry of its own, saying which version it restored; restoredFrom must exist', async () => {
    await save('autosave 3', { restoredFrom: 4 });
    await save('edited after the restore');
    const entries = await history();
    expect(entries.slice(0, 2).map((h) => [h.versionNumber, h.firstVersionNumber, h.restoredFrom])).toEqual([
      [17, 17, null],
      [16, 16, 4],
    ]);
    const bad = await analyst.json<ErrorBody>(`/api/memos/${memoId}`, {
      method: 'PATCH',
      body: JSON.stringify({ content: doc('x'), baseVersion: version, restoredFrom: 999 }),
    });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ restoredFrom: 'no saved version 999' });
  });
});

import crypto from 'node:crypto';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { runOnAppDatabase } from '../support/app-database';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

const baseUrl = inject('baseUrl');
const email = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;
async function as(role: Role) {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(email(role), DEMO_PASSWORD)).toBe(true);
  return s;
}
type Memo = { id: number; status: string; version: number; content: unknown };
type Result = { memo: Memo; revision?: { letter: string; pdfSha256: string } };

let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, customer: HttpSession, admin: HttpSession;
let memoId: number;
let reviewerId: number;
const move = (s: HttpSession, body: Record<string, unknown>) =>
  s.json<Result & { error: string; fields: Record<string, string> }>(`/api/memos/${memoId}/transitions`, {
    method: 'POST',
    body: JSON.stringify(body),
  });

beforeAll(async () => {
  [analyst, reviewer, cm, customer, admin] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'customer', 'admin'] as Role[]).map(as),
  );
  const created = await analyst.json<Memo>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'Workflow trial', templateId: 'sso-design-rationale' }),
  });
  memoId = created.body.id;
  const dir = await analyst.json<{ users: { id: number; name: string }[] }>('/api/users?role=reviewer');
  reviewerId = dir.body.users.find((u) => u.name === 'Tobias Quenby')!.id;
});

describe('review workflow over HTTP: the server enforces each transition and role', () => {
  it('draft: only the analyst may submit, with reviewers; others get 403 (404 while the memo is hidden from them), wrong-state moves 409 with the reason', async () => {
    // Not yet assigned, the reviewer cannot see the draft, nor can a customer: 404, as for an unknown memo.
    expect((await move(reviewer, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(404);
    expect((await move(customer, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(404);
    expect((await move(cm, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(403);
    const freezeTooEarly = await move(cm, { action: 'freeze', changeSummary: 'x' });
    expect(freezeTooEarly.status).toBe(409);
    expect(freezeTooEarly.body.error).toMatch(/only an approved memo can be frozen/);
    expect((await move(analyst, { action: 'submit', reviewerIds: [] })).body.fields.reviewerIds).toBe(
      'pick at least one reviewer',
    );
    expect((await move(analyst, { action: 'submit', reviewerIds: [999999] })).status).toBe(400);
    expect((await move(analyst, { action: 'launch' })).status).toBe(400);
    const submitted = await move(analyst, { action: 'submit', reviewerIds: [reviewerId] });
    expect(submitted.status).toBe(200);
    expect(submitted.body.memo.status).toBe('in-review');
  });

  it('in review: text is locked; the reviewer requests changes with a note (back to draft), then approves the resubmission', async () => {
    const edit = await analyst.json(`/api/memos/${memoId}`, {
      method: 'PATCH',
      body: JSON.stringify({ title: 'x', baseVersion: 1 }),
    });
    expect(edit.status).toBe(409);
    expect((await move(analyst, { action: 'approve' })).status).toBe(403);
    expect((await move(reviewer, { action: 'request-changes' })).body.fields.note).toBe('say what should change');
    const back = await move(reviewer, {
      action: 'request-changes',
      note: 'State the injection accuracy you assumed.',
      password: DEMO_PASSWORD,
    });
    expect(back.body.memo.status).toBe('draft');
    expect((await move(reviewer, { action: 'approve' })).status).toBe(409);
    expect((await move(analyst, { action: 'submit', reviewerIds: [reviewerId] })).body.memo.status).toBe('in-review');
    const ok = await move(reviewer, { action: 'approve', note: 'Sound.', password: DEMO_PASSWORD });
    expect(ok.body.memo.status).toBe('approved');
  });

  let sha = '';
  it('approved: the configuration manager freezes revision A with a change summary; the PDF bytes are stable and hashed', async () => {
    expect((await move(cm, { action: 'freeze', changeSummary: '  ' })).status).toBe(400);
    expect((await move(analyst, { action: 'freeze', changeSummary: 'First issue' })).status).toBe(403);
    const frozen = await move(cm, {
      action: 'freeze',
      changeSummary: 'First issue for the orbit review.',
      password: DEMO_PASSWORD,
    });
    expect(frozen.status).toBe(200);
    expect(frozen.body.memo.status).toBe('frozen');
    expect(frozen.body.revision?.letter).toBe('A');
    sha = frozen.body.revision!.pdfSha256;

    const downloads = await Promise.all([1, 2].map(() => reviewer.request(`/api/memos/${memoId}/revisions/A/pdf`)));
    const bytes = await Promise.all(downloads.map(async (r) => Buffer.from(await r.arrayBuffer())));
    expect(bytes[0].subarray(0, 5).toString()).toBe('%PDF-');
    expect(bytes[0].equals(bytes[1])).toBe(true);
    const digest = crypto.createHash('sha256').update(bytes[0]).digest('hex');
    expect(digest).toBe(sha);
    expect(downloads[0].headers.get('x-content-sha256')).toBe(sha);
    const list = await analyst.json<{ revisions: { letter: string; pdfSha256: string; changeSummary: string }[] }>(
      `/api/memos/${memoId}/revisions`,
    );
    expect(list.body.revisions).toEqual([
      expect.objectContaining({ letter: 'A', pdfSha256: sha, changeSummary: 'First issue for the orbit review.' }),
    ]);
  });

  it('frozen: editing is refused (409), re-verify finds no difference, reopening starts the next draft', async () => {
    const edit = await analyst.json(`/api/memos/${memoId}`, {
      method: 'PATCH',
      body: JSON.stringify({ title: 'x', baseVersion: 1 }),
    });
    expect(edit.status).toBe(409);
    const check = await cm.json<{ differences: unknown[]; failures: unknown[]; checkedOutputs: number }>(
      `/api/memos/${memoId}/revisions/A/reverify`,
      { method: 'POST', body: '{}' },
    );
    expect(check.status).toBe(200);
    expect(check.body.differences).toEqual([]);
    expect(check.body.failures).toEqual([]);
    expect(check.body.checkedOutputs).toBeGreaterThan(30);
    expect((await move(reviewer, { action: 'reopen' })).status).toBe(403);
    expect((await move(analyst, { action: 'reopen' })).body.memo.status).toBe('draft');
  });

  it('a direct SQL UPDATE or DELETE of a frozen revision is refused by the database trigger', async () => {
    const [upd, del] = await runOnAppDatabase(inject('appDatabaseUrl'), [
      [`UPDATE revisions SET change_summary = 'tampered' WHERE memo_id = ${memoId}`],
      [`DELETE FROM revisions WHERE memo_id = ${memoId}`],
    ]);
    expect(upd?.message).toMatch(/revisions rows are immutable/);
    expect(del?.message).toMatch(/revisions rows are immutable/);
    const again = await reviewer.request(`/api/memos/${memoId}/revisions/A/pdf`);
    expect(again.headers.get('x-content-sha256')).toBe(sha);
  });

  it('diff: a changed input after reopening shows as changed outputs and inputs against revision A', async () => {
    const memo = await analyst.json<
      Memo & {
        content: { content: { type: string; attrs?: { blockId?: string; inputs?: Record<string, unknown> } }[] };
      }
    >(`/api/memos/${memoId}`);
    const content = structuredClone(memo.body.content);
    const repeat = content.content.find((n) => n.type === 'calcBlock' && n.attrs?.blockId === 'repeat')!;
    repeat.attrs!.inputs = { revolutions: { text: '233' }, days: { text: '16' } };
    const saved = await analyst.json<Memo>(`/api/memos/${memoId}`, {
      method: 'PATCH',
      body: JSON.stringify({ content, baseVersion: memo.body.version }),
    });
    expect(saved.status).toBe(200);
    const diff = await analyst.json<{
      outputs: { blockId: string; output: string; from: string; to: string }[];
      inputs: { input: string; from: string; to: string }[];
      text: { op: string; text: string }[];
    }>(`/api/memos/${memoId}/diff?from=rA&to=current`);
    expect(diff.status).toBe(200);
    expect(diff.body.inputs).toEqual(
      expect.arrayContaining([expect.objectContaining({ input: 'revolutions', from: '175', to: '233' })]),
    );
    const alt = diff.body.outputs.find((o) => o.blockId === 'repeat' && o.output === 'altitudeKm')!;
    expect(alt.from).toMatch(/^692\.8\d* km$/);
    expect(alt.to).toMatch(/^699\.5\d* km$/);
    // The live value quoting the altitude changed in the text too (word diff: 692.8 → 699.6 km).
    expect(diff.body.text.filter((s) => s.op === 'delete').map((s) => s.text)).toContain('692');
    expect(diff.body.text.filter((s) => s.op === 'insert').map((s) => s.text)).toContain('699');
    expect((await analyst.json(`/api/memos/${memoId}/diff?from=rZ&to=current`)).status).toBe(404);
    expect((await analyst.json(`/api/memos/${memoId}/diff?from=yesterday&to=current`)).status).toBe(400);
  });

  it('audit trail: transitions, freeze and downloads are recorded; only admins read it', async () => {
    expect((await analyst.json('/api/audit')).status).toBe(403);
    const trail = await admin.json<{ events: { action: string; revisionLetter: string | null; actorEmail: string }[] }>(
      `/api/audit?memoId=${memoId}&limit=200`,
    );
    const actions = trail.body.events.map((e) => e.action);
    for (const a of [
      'memo.create',
      'memo.submit',
      'memo.request-changes',
      'memo.approve',
      'memo.freeze',
      'pdf.download',
      'revision.reverify',
      'memo.reopen',
      'memo.save',
    ])
      expect(actions).toContain(a);
    expect(trail.body.events.find((e) => e.action === 'memo.freeze')).toMatchObject({
      revisionLetter: 'A',
      actorEmail: email('config-manager'),
    });
    const signIns = await admin.json<{ events: unknown[] }>('/api/audit?action=sign-in');
    expect(signIns.body.events.length).toBeGreaterThan(4);
  });
});

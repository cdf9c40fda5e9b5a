import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { dateColumn, jsonColumn, queryAppDatabase } from '../support/app-database';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

/*
 * Electronic signatures over HTTP against the real server. What is checked:
 * approve, request changes and freeze are refused with 401 and a message
 * saying why when the password is missing or wrong, and change nothing;
 * wrong signing passwords count against the sign-in throttle (10 per
 * account, README "Throttling"), after which signing and signing in are both
 * refused; each signature is stored with printed name, role, meaning, UTC
 * time, memo version and round (and the revision letter for a freeze), is
 * carried by the frozen revision and its PDF, and is in the audit trail —
 * which also records comments, replies and resolves, reads as sentences,
 * filters by person name and document number, and exports CSV.
 */

const baseUrl = inject('baseUrl');
const demo = (role: Role) => DEMO_USERS.find((u) => u.role === role)!;
async function as(email: string, password = DEMO_PASSWORD) {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(email, password), `sign in as ${email}`).toBe(true);
  return s;
}

type Moved = { memo: { status: string }; revision?: { letter: string; pdfSha256: string } };
type Refusal = { error: string; code: string; fields?: Record<string, string>; retryAt?: string };
type AuditEvent = {
  id: number;
  action: string;
  actorName: string | null;
  documentNumber: string | null;
  revisionLetter: string | null;
  summary: string;
  details: Record<string, unknown> | null;
};

let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, admin: HttpSession;
let memoId: number, documentNumber: string, reviewerId: number;

const move = (who: HttpSession, id: number, body: Record<string, unknown>) =>
  who.json<Moved & Refusal>(`/api/memos/${id}/transitions`, { method: 'POST', body: JSON.stringify(body) });
const status = async (id: number) => (await analyst.json<{ status: string }>(`/api/memos/${id}`)).body.status;
const audit = async (query: string) => (await admin.json<{ events: AuditEvent[] }>(`/api/audit?${query}`)).body.events;

const readDb = <T>(sql: string, params: unknown[]) => queryAppDatabase<T>(inject('appDatabaseUrl'), sql, params);

async function newMemo(title: string) {
  const created = await analyst.json<{ id: number; documentNumber: string }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title, templateId: 'sso-design-rationale' }),
  });
  expect(created.status).toBe(201);
  return created.body;
}

beforeAll(async () => {
  [analyst, reviewer, cm, admin] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'admin'] as Role[]).map((r) => as(demo(r).email)),
  );
  ({ id: memoId, documentNumber } = await newMemo('Signature trial'));
  reviewerId = (
    await analyst.json<{ users: { id: number; name: string }[] }>('/api/users?role=reviewer')
  ).body.users.find((u) => u.name === demo('reviewer').name)!.id;
  expect((await move(analyst, memoId, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(200);
});

describe('signed transitions over HTTP', () => {
  it('approve and request changes: 401 without a password or with a wrong one, nothing changes; a wrong role is still 403 first', async () => {
    expect((await move(analyst, memoId, { action: 'approve', password: DEMO_PASSWORD })).status).toBe(403);
    for (const body of [{ action: 'approve' }, { action: 'request-changes', note: 'Add the ΔV table.' }]) {
      const missing = await move(reviewer, memoId, body);
      expect(missing.status, JSON.stringify(body)).toBe(401);
      expect(missing.body).toMatchObject({
        code: 'unauthenticated',
        fields: { password: 'enter your password to sign' },
      });
      expect(missing.body.error).toMatch(/^Enter your password to sign/);
      const wrong = await move(reviewer, memoId, { ...body, password: 'ternlight-demo-25' });
      expect(wrong.status).toBe(401);
      expect(wrong.body.error).toBe(
        'That password is not right; nothing was signed. Enter the password you sign in with.',
      );
      expect(wrong.body.fields).toEqual({ password: 'wrong password' });
    }
    expect(await status(memoId)).toBe('in-review');
    expect(await readDb('SELECT id FROM signatures WHERE memo_id = ?', [memoId])).toEqual([]);
    expect(await readDb('SELECT id FROM review_decisions WHERE memo_id = ?', [memoId])).toEqual([]);
    // The session stays signed in: a refused signature is not a sign-out.
    expect((await reviewer.json(`/api/memos/${memoId}`)).status).toBe(200);
    expect(await audit(`memoId=${memoId}&action=signature.refused`)).toHaveLength(2);
  });

  it('a meaning that is blank or too long is a 400 naming it', async () => {
    expect(
      (await move(reviewer, memoId, { action: 'approve', password: DEMO_PASSWORD, meaning: '  ' })).body.fields,
    ).toEqual({ meaning: 'say what the signature means, or leave it out for the default' });
    expect(
      (await move(reviewer, memoId, { action: 'approve', password: DEMO_PASSWORD, meaning: 'x'.repeat(121) })).body
        .fields,
    ).toEqual({ meaning: 'meaning must have at most 120 characters' });
  });

  it('signed with the right password: request changes with a typed meaning, then approval with the default one', async () => {
    const back = await move(reviewer, memoId, {
      action: 'request-changes',
      note: 'Add the ΔV table.',
      password: DEMO_PASSWORD,
      meaning: 'Reviewed; not approved',
    });
    expect(back.status).toBe(200);
    expect(back.body.memo.status).toBe('draft');
    expect((await move(analyst, memoId, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(200);
    expect(
      (await move(reviewer, memoId, { action: 'approve', note: 'Sound.', password: DEMO_PASSWORD })).body.memo.status,
    ).toBe('approved');
  });

  it('freeze: 401 without the right password and nothing frozen; then frozen, with every signature in the revision, its PDF and the table', async () => {
    expect((await move(cm, memoId, { action: 'freeze', changeSummary: 'First issue.' })).status).toBe(401);
    expect(
      (await move(cm, memoId, { action: 'freeze', changeSummary: 'First issue.', password: 'wrong' })).status,
    ).toBe(401);
    expect(await status(memoId)).toBe('approved');
    expect(await readDb('SELECT id FROM revisions WHERE memo_id = ?', [memoId])).toEqual([]);

    const before = Date.now();
    const frozen = await move(cm, memoId, { action: 'freeze', changeSummary: 'First issue.', password: DEMO_PASSWORD });
    expect(frozen.status).toBe(200);
    expect(frozen.body.revision?.letter).toBe('A');

    const rows = await readDb<Record<string, unknown>>(
      'SELECT user_id, printed_name, role, action, meaning, memo_version, review_round, revision_letter, signed_at FROM signatures WHERE memo_id = ? ORDER BY id',
      [memoId],
    );
    expect(rows.map((r) => [r.printed_name, r.role, r.action, r.meaning, r.review_round, r.revision_letter])).toEqual([
      [demo('reviewer').name, 'reviewer', 'request-changes', 'Reviewed; not approved', 1, null],
      [demo('reviewer').name, 'reviewer', 'approve', 'Reviewed and approved', 2, null],
      [demo('config-manager').name, 'config-manager', 'freeze', 'Released as baseline', 2, 'A'],
    ]);
    const frozenAt = dateColumn(rows[2].signed_at);
    expect(frozenAt).toBeGreaterThanOrEqual(before - 1000);
    expect(frozenAt).toBeLessThanOrEqual(Date.now());

    // The revision's stored approval (covered by the stored PDF and its SHA-256) holds the approving round's signature and the freeze.
    const [revision] = await readDb<{ approval_json: unknown }>(
      'SELECT approval_json FROM revisions WHERE memo_id = ?',
      [memoId],
    );
    const approval = jsonColumn<{
      signatures: { printedName: string; meaning: string; action: string; signedAt: string }[];
    }>(revision.approval_json);
    expect(approval.signatures.map((s) => [s.printedName, s.action, s.meaning])).toEqual([
      [demo('reviewer').name, 'approve', 'Reviewed and approved'],
      [demo('config-manager').name, 'freeze', 'Released as baseline'],
    ]);
    expect(new Date(approval.signatures[1].signedAt).getTime()).toBe(frozenAt);

    const pdf = Buffer.from(await (await cm.request(`/api/memos/${memoId}/revisions/A/pdf`)).arrayBuffer());
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-signed-')), 'A.pdf');
    fs.writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-raw', '-f', '1', '-l', '2', file, '-'], { encoding: 'utf8' }).replace(
      /\s+/g,
      ' ',
    );
    const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
    expect(text).toContain(
      `Reviewer ${demo('reviewer').name} Reviewed and approved ${utc(approval.signatures[0].signedAt)}`,
    );
    expect(text).toContain(
      `Configuration manager ${demo('config-manager').name} Released as baseline ${utc(approval.signatures[1].signedAt)}`,
    );
    // Revision record: the analyst is the author, then reviewers, then who released it.
    expect(text).toContain(
      `First issue. ${demo('analyst').name} ${demo('reviewer').name} ${demo('config-manager').name}`,
    );
  });

  it('every signature is in the audit trail as a sentence, filtered by person name and document number', async () => {
    const signed = await audit(
      `person=${encodeURIComponent(demo('reviewer').name.split(' ')[1].toLowerCase())}&document=${encodeURIComponent(documentNumber)}&action=signature.sign`,
    );
    expect(signed.map((e) => e.details?.signedAction)).toEqual(['approve', 'request-changes']);
    expect(signed[0]).toMatchObject({ actorName: demo('reviewer').name, documentNumber });
    expect(signed[0].summary).toMatch(
      new RegExp(
        `^${demo('reviewer').name} \\(Reviewer\\) electronically signed the approval of ${documentNumber} version \\d+, meaning “Reviewed and approved”, at \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} UTC\\.$`,
      ),
    );
    const freeze = await audit(`document=${encodeURIComponent(documentNumber)}&action=signature.sign&person=okafor`);
    expect(freeze).toHaveLength(1);
    expect(freeze[0]).toMatchObject({
      revisionLetter: 'A',
      details: expect.objectContaining({ meaning: 'Released as baseline' }),
    });
  });
});

describe('wrong signing passwords count against the sign-in throttle', () => {
  it('after 10 wrong passwords the account can neither sign nor sign in; the refusal says until when', async () => {
    const email = `linnea.frost.${Date.now()}@brightwater.example`;
    const password = 'linnea-frost-reviews-26';
    const created = await admin.json<{ id: number }>('/api/users', {
      method: 'POST',
      body: JSON.stringify({ email, name: 'Linnea Frost', role: 'reviewer', password }),
    });
    expect(created.status).toBe(201);
    const { id } = await newMemo('Throttle trial');
    expect((await move(analyst, id, { action: 'submit', reviewerIds: [created.body.id] })).status).toBe(200);
    const linnea = await as(email, password);
    for (let i = 0; i < 10; i++)
      expect((await move(linnea, id, { action: 'approve', password: `guess-${i}` })).status).toBe(401);
    const res = await linnea.request(`/api/memos/${id}/transitions`, {
      method: 'POST',
      body: JSON.stringify({ action: 'approve', password }),
    });
    const blocked = { status: res.status, headers: res.headers, body: (await res.json()) as Refusal };
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatch(
      /^Too many wrong passwords for this account\. Try again after \d{2}:\d{2} UTC .*Your signature was not recorded\.$/,
    );
    expect(Date.parse(blocked.body.retryAt!)).toBeGreaterThan(Date.now() + 10 * 60_000);
    expect(blocked.headers.get('retry-after')).toMatch(/^\d+$/);
    expect(await status(id)).toBe('in-review');
    expect(await new HttpSession(baseUrl).signIn(email, password)).toBe(false);
    expect(await audit(`memoId=${id}&action=signature.throttled`)).toHaveLength(1);
  });
});

describe('audit trail of review threads, and its CSV export', () => {
  it('records comments, replies, resolves and reopens with who, where and an excerpt', async () => {
    const { id, documentNumber: number } = await newMemo('Thread audit trial');
    const anchor = { quote: 'the design adopts the 12-day cycle of 175 revolutions', prefix: '', suffix: '' };
    const thread = await analyst.json<{ id: number }>(`/api/memos/${id}/comments`, {
      method: 'POST',
      body: JSON.stringify({ body: 'Is 175 the right count?', anchor }),
    });
    expect(thread.status).toBe(201);
    const patch = (body: unknown) => ({ method: 'PATCH', body: JSON.stringify(body) });
    expect(
      (
        await analyst.json(
          `/api/comments/${thread.body.id}`,
          patch({ action: 'reply', body: '=1+1, yes: checked against the repeat table.' }),
        )
      ).status,
    ).toBe(200);
    expect((await analyst.json(`/api/comments/${thread.body.id}`, patch({ action: 'resolve' }))).status).toBe(200);
    expect((await analyst.json(`/api/comments/${thread.body.id}`, patch({ action: 'reopen' }))).status).toBe(200);
    const events = await audit(`document=${encodeURIComponent(number)}&person=ilse`);
    const who = demo('analyst').name;
    expect(events.filter((e) => e.action.startsWith('comment.')).map((e) => e.summary)).toEqual([
      `${who} reopened the thread on ${number} at “${anchor.quote}”.`,
      `${who} resolved the thread on ${number} at “${anchor.quote}”.`,
      `${who} replied in a thread on ${number}: “=1+1, yes: checked against the repeat table.”`,
      `${who} commented on ${number} at “${anchor.quote}”: “Is 175 the right count?”`,
    ]);

    const csv = await admin.request(`/api/audit?format=csv&document=${encodeURIComponent(number)}`);
    expect(csv.status).toBe(200);
    expect(csv.headers.get('content-type')).toMatch(/^text\/csv; charset=utf-8/);
    expect(csv.headers.get('content-disposition')).toMatch(
      /^attachment; filename="nodewright-audit-\d{8}T\d{4}Z\.csv"$/,
    );
    const body = await csv.text();
    const lines = body.replace(/^\uFEFF/, '').split('\r\n');
    expect(lines[0]).toBe(
      '"Event","Time (UTC)","Person","E-mail","Action","Document","Revision","What happened","Details (JSON)"',
    );
    expect(lines.filter((l) => l.includes('"comment.reply"'))).toHaveLength(1);
    expect(lines.find((l) => l.includes('"comment.reply"'))).toContain(
      `"${who}","${demo('analyst').email}","comment.reply","${number}",""`,
    );
    expect(lines.at(-1)).toBe('');

    expect((await admin.json<Refusal>('/api/audit?from=2026-12-02&to=2026-12-01')).body.fields).toEqual({
      to: 'the last day comes before the first',
    });
    expect((await analyst.request('/api/audit?format=csv')).status).toBe(403);
  });
});

/**
 * Hostile and malformed memo documents over HTTP against the real server
 * (issue 11, items 3 and 4): every save path refuses them with a 400 naming
 * what and where, the memo is left as it was, and rows stored before the
 * check existed (written here by direct SQL) give the PDF and the freeze a
 * clear 409 instead of a 500 — and a legacy `javascript:` link never reaches
 * the PDF's link annotations (read back from the PDF bytes: PDFKit writes
 * annotation dictionaries, `/URI (…)`, uncompressed).
 */
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { runOnAppDatabase } from '../support/app-database';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;
async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(inject('baseUrl'));
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

type MemoBody = { id: number; version: number; content: unknown; status: string };
type ErrorBody = { error: string; code: string; fields?: Record<string, string> };

const para = (...content: unknown[]) => ({ type: 'paragraph', content });
const text = (t: string, marks?: unknown[]) => ({ type: 'text', text: t, ...(marks ? { marks } : {}) });
const doc = (...content: unknown[]) => ({ type: 'doc', content });
const link = (label: string, href: string) => text(label, [{ type: 'link', attrs: { href } }]);
function nestedQuotes(depth: number): unknown {
  let node: unknown = para(text('deep'));
  for (let i = 0; i < depth; i++) node = { type: 'blockquote', content: [node] };
  return doc(node);
}

/** Writes a memo row's content directly, as a row stored before the check existed would be. */
async function storeDirectly(memoId: number, content: unknown, status?: string): Promise<void> {
  const statements: [string, unknown[]][] = [
    ['UPDATE memos SET content_json = ? WHERE id = ?', [JSON.stringify(content), memoId]],
  ];
  if (status) statements.push(['UPDATE memos SET status = ? WHERE id = ?', [status, memoId]]);
  for (const err of await runOnAppDatabase(inject('appDatabaseUrl'), statements)) if (err) throw err;
}

let analyst: HttpSession;
let memo: MemoBody;

async function newMemo(title: string): Promise<MemoBody> {
  const created = await analyst.json<MemoBody>('/api/memos', { method: 'POST', body: JSON.stringify({ title }) });
  expect(created.status).toBe(201);
  return (await analyst.json<MemoBody>(`/api/memos/${created.body.id}`)).body;
}

async function save(content: unknown, baseVersion = memo.version) {
  return analyst.json<ErrorBody & MemoBody>(`/api/memos/${memo.id}`, {
    method: 'PATCH',
    body: JSON.stringify({ content, baseVersion }),
  });
}

/** A refused save leaves the memo exactly as it was. */
async function expectUnchanged(): Promise<void> {
  const now = await analyst.json<MemoBody>(`/api/memos/${memo.id}`);
  expect(now.body.version).toBe(memo.version);
  expect(now.body.content).toEqual(memo.content);
}

beforeAll(async () => {
  analyst = await as('analyst');
  memo = await newMemo('Hostile documents trial');
  const ok = await save(doc(para(text('A sun-synchronous orbit at 705 km.'))));
  expect(ok.status).toBe(200);
  memo = ok.body;
});

describe('PATCH /api/memos/:id refuses documents outside the schema (400 naming what and where)', () => {
  it('an unknown node type', async () => {
    const res = await save(
      doc(para(text('a')), para(text('b')), para(text('c')), { type: 'blockquote', content: [{ type: 'foo' }] }),
    );
    expect(res.status).toBe(400);
    expect(res.body.fields?.content).toBe('unknown node type "foo" at content[3].content[0]');
    expect(res.body.error).toContain('content: unknown node type "foo" at content[3].content[0]');
    await expectUnchanged();
  });

  it('an unknown mark type', async () => {
    const res = await save(doc(para(text('x', [{ type: 'marquee' }]))));
    expect(res.status).toBe(400);
    expect(res.body.fields?.content).toBe('unknown mark type "marquee" at content[0].content[0].marks[0]');
    await expectUnchanged();
  });

  it('500 nested blockquotes (17 KB) — the document that crashed the PDF renderer', async () => {
    const res = await save(nestedQuotes(500));
    expect(res.status).toBe(400);
    expect(res.body.fields?.content).toMatch(/^content is nested more than 50 levels deep at content\[0\]/);
    await expectUnchanged();
  });

  it('1 500 nested levels — the document that crashed the save itself — is a 400, and the server keeps answering', async () => {
    const res = await save(nestedQuotes(1500));
    expect(res.status).toBe(400);
    expect(res.body.fields?.content).toMatch(/nested more than 50 levels/);
    await expectUnchanged();
    expect((await analyst.json('/api/memos')).status).toBe(200);
  });

  it('javascript: and data: links, naming the link', async () => {
    const js = await save(doc(para(text('see '), link('here', 'javascript:alert(document.cookie)'))));
    expect(js.status).toBe(400);
    expect(js.body.fields?.content).toBe(
      'link to "javascript:alert(document.cookie)" at content[0].content[1].marks[0] is not allowed: only http, https, mailto and #anchor links are',
    );
    const data = await save(doc(para(link('here', 'data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg=='))));
    expect(data.status).toBe(400);
    expect(data.body.fields?.content).toMatch(/^link to "data:text\/html;base64,/);
    await expectUnchanged();
  });

  it('bad attributes of our own nodes, and an image that is not this memo’s', async () => {
    const calc = await save(doc({ type: 'calcBlock', attrs: { blockId: 'b1', kind: 'warp-drive', inputs: {} } }));
    expect(calc.status).toBe(400);
    expect(calc.body.fields?.content).toMatch(
      /invalid attribute of "calcBlock" at content\[0\]: kind: unknown calc kind "warp-drive"/,
    );
    const image = await save(doc({ type: 'image', attrs: { src: 'https://tracker.example/pixel.png' } }));
    expect(image.status).toBe(400);
    expect(image.body.fields?.content).toMatch(/is not an image uploaded to this memo/);
    await expectUnchanged();
  });

  it('an image uploaded to this memo is accepted, and allowed links are kept', async () => {
    const png = Buffer.from(
      'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==',
      'base64',
    );
    const form = new FormData();
    form.set('file', new Blob([png], { type: 'image/png' }), 'dot.png');
    const up = await analyst.json<{ url: string }>(`/api/memos/${memo.id}/attachments`, {
      method: 'POST',
      body: form,
      headers: { origin: inject('baseUrl') },
    });
    expect(up.status).toBe(201);
    const content = doc(
      para(
        link('ESA', 'https://www.esa.int/'),
        text(' · '),
        link('mail', 'mailto:ilse.marrow@brightwater.example'),
        text(' · '),
        link('below', '#figures'),
      ),
      { type: 'image', attrs: { src: up.body.url, alt: 'dot' } },
    );
    const res = await save(content);
    expect(res.status).toBe(200);
    memo = res.body;
    expect(memo.content).toEqual(content);
  });
});

describe('content stored before the check existed (direct SQL): readers refuse clearly, never 500', () => {
  it('the PDF of a memo with 500 nested blockquotes is a 409 naming the problem, and other PDFs still render', async () => {
    const legacy = await newMemo('Legacy deep memo');
    await storeDirectly(legacy.id, nestedQuotes(500));
    const pdf = await analyst.json<ErrorBody>(`/api/memos/${legacy.id}/pdf`);
    expect(pdf.status).toBe(409);
    expect(pdf.body.error).toMatch(/cannot be rendered — content is nested more than 50 levels deep at content\[0\]/);
    const fine = await analyst.request(`/api/memos/${memo.id}/pdf`);
    expect(fine.status).toBe(200);
    expect(fine.headers.get('content-type')).toBe('application/pdf');
  });

  it('an unknown node type: PDF 409, and freeze 409 naming it', async () => {
    const legacy = await newMemo('Legacy unknown-node memo');
    await storeDirectly(legacy.id, doc(para(text('fine')), { type: 'foo' }), 'approved');
    const pdf = await analyst.json<ErrorBody>(`/api/memos/${legacy.id}/pdf`);
    expect(pdf.status).toBe(409);
    expect(pdf.body.fields?.content).toBe('unknown node type "foo" at content[1]');
    const cm = await as('config-manager');
    const freeze = await cm.json<ErrorBody>(`/api/memos/${legacy.id}/transitions`, {
      method: 'POST',
      body: JSON.stringify({ action: 'freeze', changeSummary: 'first issue', password: DEMO_PASSWORD }),
    });
    expect(freeze.status).toBe(409);
    expect(freeze.body.error).toMatch(/unknown node type "foo" at content\[1\]/);
  });

  it('a stored javascript: or data: link is plain text in the PDF: no such URI among its annotations', async () => {
    const legacy = await newMemo('Legacy link memo');
    await storeDirectly(
      legacy.id,
      doc(
        para(
          link('the orbit note', 'javascript:alert(1)'),
          text(' and '),
          link('the plot', 'data:text/html,<b>x</b>'),
          text(' and '),
          link('ESA', 'https://www.esa.int/'),
        ),
      ),
    );
    const res = await analyst.request(`/api/memos/${legacy.id}/pdf`);
    expect(res.status).toBe(200);
    const bytes = Buffer.from(await res.arrayBuffer()).toString('latin1');
    // The allowed link is there as a URI annotation: the scan can see annotations at all.
    expect(bytes).toMatch(/\/URI \(https:\/\/www\.esa\.int\/\)/);
    expect(bytes).not.toMatch(/javascript:/i);
    expect(bytes).not.toMatch(/\/URI \(data:/i);
  });
});

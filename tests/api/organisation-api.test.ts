import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { HttpSession } from '../../scripts/support/http-session';
import { frozenMemo, signedIn } from '../support/delivery-flow';
import { DEMO_ORGANISATION } from '@/lib/demo/demo-organisation';
import { pageTexts, writePdf } from '../lib/pdf/support/pdf-tools';

/**
 * The issuing organisation is a setting (PUT /api/organisation, administrators
 * only): later PDFs print the new name, a frozen revision keeps the bytes it
 * stored (compared by SHA-256, FIPS 180-4) and so the name it printed.
 */

// Its own app instance: changing the organisation must not change what other test files see.
let app: AppServer;
let admin: HttpSession, analyst: HttpSession, reviewer: HttpSession, cm: HttpSession;
let frozen: { memoId: number; sha256: string };

const digest = (b: ArrayBuffer) => crypto.createHash('sha256').update(Buffer.from(b)).digest('hex');
const put = (s: HttpSession, body: unknown) =>
  s.json<{ error: string; fields?: Record<string, string>; name?: string }>('/api/organisation', {
    method: 'PUT',
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
/** The PDF's title page text (the body starts on a later page, so the memo's own words do not count) and its SHA-256. */
async function pdfText(s: HttpSession, memoId: number, name: string): Promise<{ text: string; sha256: string }> {
  const res = await s.request(`/api/memos/${memoId}/pdf`);
  expect(res.status).toBe(200);
  const bytes = await res.arrayBuffer();
  return { text: pageTexts(writePdf(name, Buffer.from(bytes)))[0], sha256: digest(bytes) };
}

beforeAll(async () => {
  app = await startAppServer();
  [admin, analyst, reviewer, cm] = await Promise.all(
    (['admin', 'analyst', 'reviewer', 'config-manager'] as const).map((r) => signedIn(app.baseUrl, r)),
  );
  frozen = await frozenMemo({ analyst, reviewer, cm }, 'TERNLIGHT-1 organisation kept in the baseline');
}, 300_000);
afterAll(() => app?.stop());

describe('organisation setting over HTTP', () => {
  it('starts as the demo organisation the seed stored', async () => {
    const res = await admin.json<{ name: string }>('/api/organisation');
    expect(res.status).toBe(200);
    expect(res.body.name).toBe(DEMO_ORGANISATION);
  });

  it('401 without a session, 403 for every role but administrator', async () => {
    expect((await put(new HttpSession(app.baseUrl), { name: 'x', distributionStatement: 'y' })).status).toBe(401);
    for (const s of [analyst, reviewer, cm]) {
      expect((await put(s, { name: 'Elsewhere', distributionStatement: 'y' })).status).toBe(403);
      expect((await s.json('/api/organisation')).status).toBe(403);
    }
  });

  it('400 naming the field for empty, missing, unknown or non-JSON input', async () => {
    const empty = await put(admin, { name: '  ', distributionStatement: 'y' });
    expect(empty.status).toBe(400);
    expect(empty.body.fields?.name).toBe('name is required');
    const missing = await put(admin, { name: 'x' });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.fields ?? {})).toContain('distributionStatement');
    expect((await put(admin, { name: 'x', distributionStatement: 'y', logo: 'z' })).status).toBe(400);
    expect((await put(admin, '{name')).status).toBe(400);
  });

  it('a new name is printed by later PDFs, while the frozen revision keeps its bytes and the name it printed', async () => {
    const before = await pdfText(analyst, frozen.memoId, `organisation-frozen-before-${frozen.memoId}.pdf`);
    expect(before.sha256).toBe(frozen.sha256);
    expect(before.text).toContain(DEMO_ORGANISATION);

    const saved = await put(admin, {
      name: 'Fenwick Orbital Works',
      distributionStatement: 'Distribution: Fenwick Orbital Works staff only.',
    });
    expect(saved.status).toBe(200);
    expect(saved.body.name).toBe('Fenwick Orbital Works');

    const after = await pdfText(analyst, frozen.memoId, `organisation-frozen-after-${frozen.memoId}.pdf`);
    expect(after.sha256).toBe(frozen.sha256);

    const created = await analyst.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'TERNLIGHT-1 organisation draft' }),
    });
    expect(created.status).toBe(201);
    const draft = await pdfText(analyst, created.body.id, `organisation-draft-${created.body.id}.pdf`);
    expect(draft.text).toContain('Fenwick Orbital Works');
    expect(draft.text).toContain('Fenwick Orbital Works staff only');
    expect(draft.text).not.toContain(DEMO_ORGANISATION);
  });
});

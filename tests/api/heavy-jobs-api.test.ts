/**
 * Heavy work over HTTP (issue 11, item 8 and the end of item 3): PDFs render
 * in the worker pool, so a customer's portal and a memo read are answered
 * while ten PDFs are rendering, in order: before the first PDF is out, and,
 * asked again when it is, before the second (with the PDFs rendered on the
 * request thread, as before the pool, that second pair came after several
 * PDFs; the first pair alone does not tell the two apart); one person gets 429 with Retry-After beyond
 * two heavy jobs at once; a calculation over its budget is stopped with a
 * 422 naming the inputs to change; a PDF whose content kills react-pdf's
 * layout engine gets a clear 422 and the next PDF of any memo still works.
 *
 * The shared server runs the default limits; a second server of this file
 * allows ten jobs per person (so one person can ask for ten PDFs) and a
 * 1 s calculation budget, with one worker thread.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

const email = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;
async function as(baseUrl: string, role: Role) {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(email(role), DEMO_PASSWORD)).toBe(true);
  return s;
}
async function demoMemoId(s: HttpSession): Promise<number> {
  const list = await s.json<{ memos: { id: number; documentNumber: string }[] }>('/api/memos');
  return list.body.memos.find((m) => m.documentNumber === 'BWO-TL1-DM-001')!.id;
}

let own: AppServer;
beforeAll(async () => {
  own = await startAppServer({
    NODEWRIGHT_HEAVY_JOBS_PER_USER: '10',
    NODEWRIGHT_CALC_TIME_BUDGET_SECONDS: '1',
    NODEWRIGHT_PDF_TIME_BUDGET_SECONDS: '600',
    NODEWRIGHT_WORKER_THREADS: '1',
  });
});
afterAll(() => own?.stop());

describe('heavy work in the worker pool', () => {
  it('answers a customer portal and a memo read while ten PDFs render: before the first PDF, and between two PDFs', async () => {
    const [analyst, customer] = await Promise.all([as(own.baseUrl, 'analyst'), as(own.baseUrl, 'customer')]);
    const memoId = await demoMemoId(analyst);
    const done: string[] = [];
    const lightRequests = (label: string) => [
      customer.json('/api/portal').then((r) => (done.push(`portal ${label}`), r.status)),
      analyst.json(`/api/memos/${memoId}`).then((r) => (done.push(`memo read ${label}`), r.status)),
    ];
    let after: Promise<number>[] = [];
    const pdfs = Array.from({ length: 10 }, () =>
      analyst.request(`/api/memos/${memoId}/pdf`).then(async (res) => {
        const bytes = Buffer.from(await res.arrayBuffer());
        done.push('pdf');
        // as soon as the first PDF is out, the light requests again: one worker thread renders the next PDF meanwhile
        if (done.filter((d) => d === 'pdf').length === 1) after = lightRequests('after the first PDF');
        return { status: res.status, head: bytes.subarray(0, 5).toString('latin1') };
      }),
    );
    await new Promise((r) => setTimeout(r, 300)); // the PDF requests are in
    expect(await Promise.all(lightRequests('during'))).toEqual([200, 200]);
    const results = await Promise.all(pdfs);
    expect(await Promise.all(after)).toEqual([200, 200]);
    expect(results.every((r) => r.status === 200 && r.head === '%PDF-')).toBe(true);
    const pdfAt = done.flatMap((d, i) => (d === 'pdf' ? [i] : []));
    expect(pdfAt).toHaveLength(10);
    // with the PDFs on the request thread (before the worker pool) the second pair waited behind the other renders
    expect(done.slice(0, pdfAt[1]).sort()).toEqual([
      'memo read after the first PDF',
      'memo read during',
      'pdf',
      'portal after the first PDF',
      'portal during',
    ]);
  }, 300_000);

  it('refuses a third heavy job of one person with 429, Retry-After and a message saying why', async () => {
    const baseUrl = inject('baseUrl');
    const cm = await as(baseUrl, 'config-manager');
    const memoId = await demoMemoId(cm);
    const responses = await Promise.all(Array.from({ length: 4 }, () => cm.request(`/api/memos/${memoId}/pdf`)));
    const statuses = responses.map((r) => r.status).sort();
    expect(statuses).toEqual([200, 200, 429, 429]);
    for (const res of responses.filter((r) => r.status === 429)) {
      expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
      const body = (await res.json()) as { code: string; error: string };
      expect(body.code).toBe('too_many_requests');
      expect(body.error).toMatch(/at most 2 run at once per person/);
    }
    await Promise.all(responses.filter((r) => r.status === 200).map((r) => r.arrayBuffer()));
  }, 300_000);

  it('stops a calculation over its budget with 422 naming the inputs; the pool then renders a PDF', async () => {
    const analyst = await as(own.baseUrl, 'analyst');
    const long = { altitudeKm: 300, inclinationDeg: 98.2, days: 400, integrator: 'dopri5', relTol: 1e-13 };
    const res = await analyst.json<{ code: string; error: string; fields: Record<string, string> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'propagation-check', inputs: long }),
    });
    expect(res.status).toBe(422);
    expect(res.body.code).toBe('unprocessable');
    expect(res.body.error).toMatch(
      /ran longer than 1 s, the limit for one calculation, and was stopped: try a shorter span \(days\)/,
    );
    expect(Object.keys(res.body.fields)).toEqual(['days', 'relTol', 'integrator']);
    const pdf = await analyst.request(`/api/memos/${await demoMemoId(analyst)}/pdf`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get('content-type')).toBe('application/pdf');
  }, 120_000);

  // A document that kills react-pdf's layout engine is refused before rendering since saves and renders are
  // checked against the document schema (tests/api/memo-content-api.test.ts); the pool's containment of a
  // renderer that dies anyway is checked on the pool itself in tests/lib/jobs.
});

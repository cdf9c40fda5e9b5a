import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { streamRequest, type StreamedAnswer } from '../support/stream-request';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

/**
 * Request size limits before parsing (issue 11, item 8, first half), over HTTP
 * against the real server. Large bodies are streamed; the check is that the
 * server answers before the body is complete — it refused without reading it —
 * and, for a body without a declared length, that it stopped taking the body
 * at its cut-off (lib/edge/limit-request-body.ts), so the client could not
 * get far past it; never a timing.
 */

const baseUrl = inject('baseUrl');
const MIB = 1024 * 1024;
const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;

async function as(role: Role): Promise<HttpSession> {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD), `sign in as ${role}`).toBe(true);
  return s;
}

const filler = Buffer.alloc(64 * 1024, 'a');
const BOUNDARY = 'nodewright-limit-test';
const multipartHead = Buffer.concat([
  Buffer.from(
    `--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="large.png"\r\nContent-Type: image/png\r\n\r\n`,
  ),
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
]);

let analyst: HttpSession;
let customer: HttpSession;
let draftId: number;

beforeAll(async () => {
  analyst = await as('analyst');
  customer = await as('customer');
  const created = await analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'Upload limits draft' }),
  });
  expect(created.status).toBe(201);
  draftId = created.body.id;
});

/**
 * How much of a body refused by its declared length may have been sent when the answer arrives: less than all
 * of it. The server discards such a body as it arrives (it keeps none of it), so the client is never held back
 * and how far it gets depends only on how soon it reads the answer; the bodies are 200 MiB to leave it room.
 */
const DECLARED_UNSENT = 200 * MIB;

/**
 * A refused body: the 413 in the error shape, or — when the server closed the connection while the client was
 * still writing and the answer was lost in that race — a reset, with the status when it arrived before the
 * reset. Either way with most of the body unsent.
 */
function expectRefusedEarly(answer: StreamedAnswer, status: number[], maxBytesSent: number): void {
  expect(answer.bytesSent).toBeLessThan(maxBytesSent);
  if (answer.reset && answer.status === 0) return;
  expect(status).toContain(answer.status);
  if (answer.reset) return;
  if (status.includes(413)) expect(answer.body).toMatchObject({ code: 'too_large' });
}

describe('anonymous JSON routes', () => {
  for (const declareLength of [true, false]) {
    it(`a ${declareLength ? 200 : 100} MB body to POST /api/password-resets is refused with 413 before it is read (${declareLength ? 'Content-Length declared' : 'chunked, no length'})`, async () => {
      const answer = await streamRequest(`${baseUrl}/api/password-resets`, {
        headers: { 'content-type': 'application/json' },
        totalBytes: (declareLength ? 200 : 100) * MIB,
        prefix: Buffer.from('{"email":"'),
        chunk: filler,
        declareLength,
      });
      // A declared length over the largest body any route accepts is refused by the server before the route runs;
      // a chunked one by the route at its 4 MiB limit.
      expectRefusedEarly(answer, [413], declareLength ? DECLARED_UNSENT : 40 * MIB);
      if (!answer.reset)
        expect(String(answer.body?.error)).toMatch(
          declareLength ? /larger than this server accepts \(at most 5\.1 MiB\)/ : /at most 4 MiB/,
        );
    });
  }

  it('POST /api/invitations/accept: the same limit', async () => {
    const answer = await streamRequest(`${baseUrl}/api/invitations/accept`, {
      headers: { 'content-type': 'application/json' },
      totalBytes: 100 * MIB,
      prefix: Buffer.from('{"token":"'),
      chunk: filler,
    });
    expectRefusedEarly(answer, [413], 40 * MIB);
  });

  it('next-auth sign-in: a body over 64 KiB is refused with 413', async () => {
    const answer = await streamRequest(`${baseUrl}/api/auth/callback/credentials`, {
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      totalBytes: 20 * MIB,
      prefix: Buffer.from('email='),
      chunk: filler,
    });
    expectRefusedEarly(answer, [413], 20 * MIB);
  });

  it('a body within the limit still works', async () => {
    const res = await new HttpSession(baseUrl).json('/api/password-resets', {
      method: 'POST',
      body: JSON.stringify({ email: 'nobody@nowhere.example' }),
    });
    expect(res.status).toBe(202);
  });
});

describe('signed-in JSON routes', () => {
  it('a 5 MiB JSON body to POST /api/memos is a 413 in the error shape', async () => {
    const title = 'x'.repeat(5 * MIB);
    const res = await analyst.json<{ error: string; code: string }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title }),
    });
    expect(res.status).toBe(413);
    expect(res.body.code).toBe('too_large');
  });
});

describe('image upload: permission before the body, then the size', () => {
  const upload = (session: HttpSession, memoId: number, declareLength: boolean) =>
    streamRequest(`${baseUrl}/api/memos/${memoId}/attachments`, {
      headers: {
        cookie: session.cookieHeader(),
        origin: baseUrl,
        'content-type': `multipart/form-data; boundary=${BOUNDARY}`,
      },
      totalBytes: declareLength ? DECLARED_UNSENT : 60 * MIB,
      prefix: multipartHead,
      chunk: Buffer.alloc(64 * 1024),
      declareLength,
    });

  for (const declareLength of [true, false]) {
    // With its length declared, the upload is over what any route accepts: 413 from the server, before the session
    // is looked at (it says nothing about the memo). Chunked, the route's permission check answers first, and the
    // server stops taking the body at its cut-off (twice the largest route limit, about 10 MiB).
    it(`a ${declareLength ? 200 : 60} MB upload by a customer is refused (${declareLength ? '413' : '403/404'}) without reading it (${declareLength ? 'Content-Length declared' : 'chunked'})`, async () => {
      const answer = await upload(customer, draftId, declareLength);
      expectRefusedEarly(answer, declareLength ? [413] : [403, 404], declareLength ? DECLARED_UNSENT : 30 * MIB);
    });

    it(`a ${declareLength ? 200 : 60} MB upload by the analyst on their draft is a 413 (${declareLength ? 'Content-Length declared' : 'chunked'})`, async () => {
      const answer = await upload(analyst, draftId, declareLength);
      expectRefusedEarly(answer, [413], declareLength ? DECLARED_UNSENT : 30 * MIB);
    });
  }

  it('a small PNG is still stored', async () => {
    // 1×1 transparent PNG (PNG specification, ISO/IEC 15948, minimal IHDR/IDAT/IEND).
    const png = Buffer.from(
      'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
      'base64',
    );
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(png)], { type: 'image/png' }), 'dot.png');
    const res = await analyst.json<{ id: number; url: string }>(`/api/memos/${draftId}/attachments`, {
      method: 'POST',
      body: form,
      headers: { origin: baseUrl },
    });
    expect(res.status).toBe(201);
    const got = await analyst.request(res.body.url);
    expect(got.status).toBe(200);
    expect(Buffer.from(await got.arrayBuffer()).equals(png)).toBe(true);
  });
});

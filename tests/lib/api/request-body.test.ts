import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api/errors';
import { readBodyBytes, readJsonBody, readMultipartForm } from '@/lib/api/request-body';

/** The size-limited body readers of lib/api/request-body.ts, on requests built in memory. */

const KIB = 1024;

/** A body of `chunks` chunks of 1 KiB, counting how many the reader pulled. */
function countedStream(chunks: number) {
  const pulled = { count: 0 };
  const stream = new ReadableStream<Uint8Array>(
    {
      pull(controller) {
        if (pulled.count >= chunks) return controller.close();
        pulled.count++;
        controller.enqueue(new Uint8Array(KIB));
      },
    },
    { highWaterMark: 0 },
  );
  return { stream, pulled };
}

async function statusOf(p: Promise<unknown>): Promise<number> {
  try {
    await p;
    return 200;
  } catch (err) {
    return err instanceof ApiError ? err.status : 500;
  }
}

describe('readBodyBytes', () => {
  it('refuses a declared Content-Length over the limit without reading a byte', async () => {
    const { stream, pulled } = countedStream(1000);
    const req = new Request('http://x/api', {
      method: 'POST',
      body: stream,
      headers: { 'content-length': String(1000 * KIB) },
      duplex: 'half',
    } as RequestInit);
    expect(await statusOf(readBodyBytes(req, 10 * KIB))).toBe(413);
    expect(pulled.count).toBe(0);
  });

  it('stops a chunked body as soon as it passes the limit', async () => {
    const { stream, pulled } = countedStream(100_000);
    const req = new Request('http://x/api', { method: 'POST', body: stream, duplex: 'half' } as RequestInit);
    expect(await statusOf(readBodyBytes(req, 10 * KIB))).toBe(413);
    expect(pulled.count).toBeLessThan(20);
  });

  it('returns a body within the limit whole', async () => {
    const { stream } = countedStream(10);
    const req = new Request('http://x/api', { method: 'POST', body: stream, duplex: 'half' } as RequestInit);
    expect((await readBodyBytes(req, 10 * KIB)).length).toBe(10 * KIB);
  });
});

describe('readJsonBody and readMultipartForm', () => {
  const post = (body: BodyInit, type?: string) =>
    new Request('http://x/api', { method: 'POST', body, headers: type ? { 'content-type': type } : {} });

  it('JSON: 415 for another or a missing type, 400 for malformed JSON, the value otherwise', async () => {
    expect(await statusOf(readJsonBody(post('{"a":1}', 'text/plain')))).toBe(415);
    expect(await statusOf(readJsonBody(post('{"a":1}')))).toBe(415);
    expect(await statusOf(readJsonBody(post('{a', 'application/json')))).toBe(400);
    expect(await readJsonBody(post('{"a":1}', 'application/json; charset=utf-8'))).toEqual({ a: 1 });
  });

  it('multipart: 415 for JSON, 413 over the limit, the form otherwise', async () => {
    expect(await statusOf(readMultipartForm(post('{}', 'application/json'), 1000))).toBe(415);
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(2000)], { type: 'image/png' }), 'a.png');
    const encoded = new Request('http://x/api', { method: 'POST', body: form });
    expect(await statusOf(readMultipartForm(encoded.clone(), 1000))).toBe(413);
    const parsed = await readMultipartForm(encoded, 10_000);
    expect((parsed.get('file') as File).size).toBe(2000);
  });
});

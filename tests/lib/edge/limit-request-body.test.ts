import http from 'node:http';
import net, { type AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { limitRequestBody } from '@/lib/edge/limit-request-body';
import { streamRequest } from '../../support/stream-request';

/**
 * The server-level body bounds against a real node:http server whose handler
 * reads like Next does (every byte, as fast as it comes, answering only at the
 * end), with small limits. Checked against HTTP semantics (RFC 9110, 15.5.14:
 * 413 Content Too Large) and against what the handler actually received.
 */

const LIMITS = { largestBodyBytes: 64 * 1024, cutOffBytes: 256 * 1024 };
let server: http.Server;
let baseUrl: string;
const received: { bytes: number; handled: boolean; ended: boolean }[] = [];

beforeAll(async () => {
  server = http.createServer((req, res) => {
    if (!limitRequestBody(req, res, LIMITS)) return;
    const seen = { bytes: 0, handled: true, ended: false };
    received.push(seen);
    req.on('data', (c: Buffer) => (seen.bytes += c.length));
    req.on('error', () => {});
    req.on('end', () => {
      seen.ended = true;
      res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify({ bytes: seen.bytes }));
    });
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(() => new Promise<void>((r) => server.close(() => r())));

describe('limitRequestBody', () => {
  it('a declared Content-Length over the largest body is a 413 in the error shape, and the handler never runs', async () => {
    const before = received.length;
    const answer = await streamRequest(`${baseUrl}/anything`, {
      headers: { 'content-type': 'application/json' },
      totalBytes: 8 * 1024 * 1024,
      chunk: Buffer.alloc(16 * 1024, 'a'),
      declareLength: true,
    });
    expect(received.length).toBe(before);
    if (answer.status !== 0) {
      expect(answer.status).toBe(413);
      if (!answer.reset) {
        expect(answer.body).toMatchObject({ code: 'too_large' });
        expect(String(answer.body?.error)).toMatch(/larger than this server accepts \(at most 64 KiB\)/);
      }
    }
    expect(answer.bytesSent).toBeLessThan(8 * 1024 * 1024);
  });

  it('a chunked body is cut off once it passes the cut-off: the handler never sees more than the cut-off', async () => {
    const before = received.length;
    const answer = await streamRequest(`${baseUrl}/anything`, {
      headers: { 'content-type': 'application/octet-stream' },
      totalBytes: 64 * 1024 * 1024,
      chunk: Buffer.alloc(16 * 1024, 'b'),
    });
    expect(answer.reset).toBe(true);
    expect(answer.bytesSent).toBeLessThan(64 * 1024 * 1024);
    const seen = received[before];
    expect(seen.ended).toBe(false);
    expect(seen.bytes).toBeLessThanOrEqual(LIMITS.cutOffBytes);
  });

  it('a refused declared body still arriving after the 413 ends with the connection, not with the declared length', async () => {
    // A client that declares 1 GB and keeps sending 16 KiB every 50 ms would take about 50 minutes.
    const socket = net.connect(Number(new URL(baseUrl).port), '127.0.0.1');
    socket.on('error', () => {});
    let answer = '';
    socket.on('data', (c: Buffer) => (answer += c.toString('latin1')));
    socket.write(
      'POST /slow HTTP/1.1\r\nHost: x\r\nContent-Type: application/json\r\nContent-Length: 1000000000\r\n\r\n',
    );
    const drip = setInterval(() => socket.write(Buffer.alloc(16 * 1024, 'd')), 50);
    const closedAfterMs = await new Promise<number>((resolve) => {
      const start = Date.now();
      socket.on('close', () => resolve(Date.now() - start));
      setTimeout(() => resolve(Infinity), 20_000);
    });
    clearInterval(drip);
    socket.destroy();
    expect(answer).toMatch(/^HTTP\/1\.1 413 /);
    expect(answer).toContain('"code":"too_large"');
    expect(closedAfterMs).toBeLessThan(20_000);
  }, 30_000);

  it('bodies within the limits pass through whole, declared or chunked', async () => {
    for (const declareLength of [true, false]) {
      const answer = await streamRequest(`${baseUrl}/anything`, {
        headers: { 'content-type': 'application/octet-stream' },
        totalBytes: LIMITS.largestBodyBytes,
        chunk: Buffer.alloc(4096, 'c'),
        declareLength,
      });
      expect(answer.status).toBe(200);
      expect(answer.body).toEqual({ bytes: LIMITS.largestBodyBytes });
    }
  });
});

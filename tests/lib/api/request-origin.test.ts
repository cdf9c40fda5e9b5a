import { afterEach, describe, expect, it } from 'vitest';
import { assertSameOriginWrite, ownOrigins } from '@/lib/api/request-origin';
import { ApiError } from '@/lib/api/errors';

/**
 * The CSRF rule of lib/api/request-origin.ts, case by case. Origins are
 * compared as the Fetch Living Standard serialises them (scheme://host[:port],
 * default ports omitted); `Origin: null` is what browsers send from opaque
 * origins such as sandboxed frames.
 */

const saved = process.env.NEXTAUTH_URL;
afterEach(() => {
  process.env.NEXTAUTH_URL = saved;
});

function request(method: string, headers: Record<string, string>, url = 'http://localhost:3000/api/memos'): Request {
  return new Request(url, { method, headers });
}

function outcome(req: Request): string {
  try {
    assertSameOriginWrite(req);
    return 'accepted';
  } catch (err) {
    return err instanceof ApiError ? `${err.status} ${String(err.details?.reason)}` : 'other error';
  }
}

describe('assertSameOriginWrite', () => {
  process.env.NEXTAUTH_URL = 'https://nodewright.example';
  const host = { host: '127.0.0.1:3000' };

  it.each([
    ['own origin by Host', 'POST', { ...host, origin: 'http://127.0.0.1:3000' }, 'accepted'],
    ['NEXTAUTH_URL origin', 'PATCH', { ...host, origin: 'https://nodewright.example' }, 'accepted'],
    ['another port of the same host', 'POST', { ...host, origin: 'http://127.0.0.1:3001' }, '403 cross_origin'],
    ['another scheme', 'POST', { ...host, origin: 'https://127.0.0.1:3000' }, '403 cross_origin'],
    ['Origin: null', 'DELETE', { ...host, origin: 'null' }, '403 cross_origin'],
    [
      'a look-alike host name',
      'POST',
      { ...host, origin: 'https://nodewright.example.attacker.example' },
      '403 cross_origin',
    ],
    ['own Referer without Origin', 'POST', { ...host, referer: 'http://127.0.0.1:3000/memos/4' }, 'accepted'],
    ['foreign Referer without Origin', 'PUT', { ...host, referer: 'http://127.0.0.1:3001/x' }, '403 cross_origin'],
    ['an unreadable Referer', 'POST', { ...host, referer: 'not a url' }, '403 cross_origin'],
    ['neither header, JSON (a script)', 'POST', { ...host, 'content-type': 'application/json' }, 'accepted'],
    ['neither header, no body type (a script)', 'POST', { ...host }, 'accepted'],
    [
      'neither header, text/plain (a form)',
      'POST',
      { ...host, 'content-type': 'text/plain;charset=UTF-8' },
      '403 cross_origin',
    ],
    [
      'neither header, urlencoded (a form)',
      'POST',
      { ...host, 'content-type': 'application/x-www-form-urlencoded' },
      '403 cross_origin',
    ],
    [
      'neither header, multipart (a form)',
      'POST',
      { ...host, 'content-type': 'multipart/form-data; boundary=x' },
      '403 cross_origin',
    ],
    ['GET is never refused for its Origin', 'GET', { ...host, origin: 'http://elsewhere.example' }, 'accepted'],
  ])('%s', (_name, method, headers, expected) => {
    process.env.NEXTAUTH_URL = 'https://nodewright.example';
    expect(outcome(request(method, headers))).toBe(expected);
  });

  it('own origins: the Host the request was sent to and NEXTAUTH_URL, normalised', () => {
    process.env.NEXTAUTH_URL = 'https://nodewright.example:443/base/';
    expect([...ownOrigins(request('POST', { host: 'localhost:4100' }, 'http://localhost:4100/api/x'))].sort()).toEqual([
      'http://localhost:4100',
      'https://nodewright.example',
    ]);
  });
});

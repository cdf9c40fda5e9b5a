import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { encode } from 'next-auth/jwt';
import { decodeSessionCookie } from '@/lib/sessions/decode-session-cookie';

/**
 * The session cookie as next-auth itself writes it (its `encode`, JWE with
 * the key derived from NEXTAUTH_SECRET), read back by our decoder, which
 * remembers tokens it has verified: a remembered token must still stop
 * working at its expiry, and nothing but an intact token may be read.
 */
const secret = 'decode-session-cookie-test-secret-0123456789abcdef';
const cookieName = 'next-auth.session-token';

beforeAll(() => {
  vi.stubEnv('NEXTAUTH_SECRET', secret);
  vi.stubEnv('NEXTAUTH_URL', 'http://localhost:3000');
});

afterEach(() => {
  vi.useRealTimers();
});

describe('decodeSessionCookie', () => {
  it('reads the person and session id from a token next-auth encoded', async () => {
    const token = await encode({ token: { uid: 7, sid: 'session-a' }, secret, maxAge: 3600 });
    expect(await decodeSessionCookie({ [cookieName]: token })).toEqual({ userId: 7, sessionId: 'session-a' });
    // A second read (answered from what was verified) gives the same.
    expect(await decodeSessionCookie({ [cookieName]: token })).toEqual({ userId: 7, sessionId: 'session-a' });
  });

  it('refuses a token once it has expired, even one it verified before', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-02T12:00:00Z'));
    const token = await encode({ token: { uid: 8, sid: 'session-b' }, secret, maxAge: 60 });
    expect(await decodeSessionCookie({ [cookieName]: token })).toEqual({ userId: 8, sessionId: 'session-b' });
    vi.setSystemTime(new Date('2026-12-02T12:01:01Z'));
    expect(await decodeSessionCookie({ [cookieName]: token })).toBeNull();
  });

  it('refuses an altered token, one under another secret, and none at all', async () => {
    const token = await encode({ token: { uid: 9, sid: 'session-c' }, secret, maxAge: 3600 });
    const parts = token.split('.');
    parts[3] = (parts[3][0] === 'A' ? 'B' : 'A') + parts[3].slice(1);
    expect(await decodeSessionCookie({ [cookieName]: parts.join('.') })).toBeNull();
    const foreign = await encode({
      token: { uid: 9, sid: 'session-c' },
      secret: 'another-secret-of-enough-length-0123456789',
      maxAge: 3600,
    });
    expect(await decodeSessionCookie({ [cookieName]: foreign })).toBeNull();
    expect(await decodeSessionCookie({})).toBeNull();
  });

  it('refuses a token without a numeric user id', async () => {
    const token = await encode({ token: { uid: '9' as unknown as number, sid: 'session-d' }, secret, maxAge: 3600 });
    expect(await decodeSessionCookie({ [cookieName]: token })).toBeNull();
  });
});

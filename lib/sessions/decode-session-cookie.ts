import { decode, getToken, type JWT, type JWTDecodeParams } from 'next-auth/jwt';
import { resolveAuthSecret } from '@/lib/config/auth-secret';

/** What a valid session token names: the person and their session row. */
export interface SessionClaims {
  userId: number;
  sessionId: string | undefined;
}

/**
 * Tokens already decrypted and verified by this process, by their exact
 * text. next-auth's decode derives the key with HKDF on every call (hundreds
 * of microseconds on a loaded core, more than the decryption itself), and a
 * signed-in browser sends the same token with every request until it signs
 * in again. A token's text is its proof: one that decrypted once under this
 * secret decrypts again to the same payload, so only its expiry has to be
 * checked again (here, with no grace). Bounded; the oldest entry goes first.
 * Revocation does not depend on it: the session row is read on every request.
 */
const verified = new Map<string, { payload: JWT; secret: string; expiresAtMs: number }>();
const VERIFIED_MAX = 5000;

async function decodeRemembered(params: JWTDecodeParams): Promise<JWT | null> {
  const token = params.token;
  if (!token) return null;
  const secret = String(params.secret);
  const seen = verified.get(token);
  if (seen && seen.secret === secret) {
    if (Date.now() < seen.expiresAtMs) return seen.payload;
    verified.delete(token);
    return null;
  }
  const payload = await decode(params);
  if (payload && typeof payload.exp === 'number') {
    if (verified.size >= VERIFIED_MAX) verified.delete(verified.keys().next().value as string);
    verified.set(token, { payload, secret, expiresAtMs: payload.exp * 1000 });
  }
  return payload;
}

/** Read once: without NEXTAUTH_SECRET in the environment it comes from a file (auth-secret.ts), as for authOptions. */
let authSecret: string | undefined;

/**
 * Decrypts and checks (encryption tag, expiry) the next-auth session cookie
 * among `cookies`, under next-auth's own cookie name for this NEXTAUTH_URL;
 * null when there is none or it does not verify. Says nothing about whether
 * the session is still open: load-session-actor.ts does that.
 */
export async function decodeSessionCookie(cookies: Record<string, string>): Promise<SessionClaims | null> {
  let token: JWT | null;
  try {
    token = await getToken({
      req: { cookies, headers: {} } as unknown as Parameters<typeof getToken>[0]['req'],
      secret: (authSecret ??= resolveAuthSecret()),
      decode: decodeRemembered,
    });
  } catch {
    return null;
  }
  if (!token || typeof token.uid !== 'number') return null;
  return { userId: token.uid, sessionId: typeof token.sid === 'string' ? token.sid : undefined };
}

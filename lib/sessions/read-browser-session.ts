import type { Actor } from '@/lib/auth/permissions';
import { decodeSessionCookie } from './decode-session-cookie';
import { loadSessionActor } from './load-session-actor';

function parseCookies(header: string | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  for (const part of (header ?? '').split(';')) {
    const i = part.indexOf('=');
    if (i > 0) out[part.slice(0, i).trim()] = part.slice(i + 1).trim();
  }
  return out;
}

/**
 * Who is signed in in the browser that sent these headers, if anyone (a live
 * session only). For next-auth's credentials providers, which see the request
 * headers but not the session: the delivery-link provider must not switch a
 * browser that is signed in as someone else.
 */
export async function readBrowserSession(
  headers: Record<string, string | string[] | undefined>,
): Promise<Actor | null> {
  const cookie = headers.cookie;
  const claims = await decodeSessionCookie(parseCookies(Array.isArray(cookie) ? cookie.join('; ') : cookie));
  return claims ? loadSessionActor(claims.sessionId, claims.userId) : null;
}

import { ApiError } from './errors';

/**
 * The cross-site request forgery rule for every state-changing API request
 * (POST, PUT, PATCH, DELETE under /api, except next-auth's own /api/auth/**,
 * which checks its own CSRF token). Called by the route-handler wrappers
 * before the session is read or the body is touched.
 *
 * 1. `Origin` present: it must be one of the app's own origins — the origin the
 *    request was addressed to (its scheme and `Host`), or NEXTAUTH_URL's origin.
 *    `Origin: null` (sandboxed frames, privacy-redirected requests) is refused.
 * 2. No `Origin` but a `Referer`: the Referer's origin must be one of them.
 * 3. Neither: not a browser. Browsers add `Origin` to every request whose
 *    method is neither GET nor HEAD (Fetch Living Standard, "Origin header";
 *    Chrome since 2019, Firefox since 70), so a request without both comes from
 *    a script such as the CLI or a test. It is accepted unless its Content-Type
 *    is one of the three an HTML form can send (application/x-www-form-urlencoded,
 *    multipart/form-data, text/plain): a form post without Origin can only be an
 *    old or unusual browser, and the JSON routes refuse those types anyway.
 *    Non-browser clients that upload (multipart) therefore send an Origin.
 */
const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const FORM_CONTENT_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain'];

export function isStateChanging(method: string): boolean {
  return STATE_CHANGING.has(method.toUpperCase());
}

function originOf(url: string | undefined | null): string | null {
  if (!url) return null;
  try {
    const u = new URL(url);
    return u.protocol === 'http:' || u.protocol === 'https:' ? u.origin : null;
  } catch {
    return null;
  }
}

/** The origins a state-changing request may come from: the one it was sent to, and the configured public URL. */
export function ownOrigins(req: Request): Set<string> {
  const origins = new Set<string>();
  const url = new URL(req.url);
  const host = req.headers.get('host');
  if (host) {
    const own = originOf(`${url.protocol}//${host}`);
    if (own) origins.add(own);
  }
  const configured = originOf(process.env.NEXTAUTH_URL);
  if (configured) origins.add(configured);
  return origins;
}

function refuse(message: string): ApiError {
  return new ApiError('forbidden', message, { details: { reason: 'cross_origin' } });
}

/** Throws a 403 (`code: 'forbidden'`, `reason: 'cross_origin'`) when a state-changing request did not come from the app's own pages. */
export function assertSameOriginWrite(req: Request): void {
  if (!isStateChanging(req.method)) return;
  const allowed = ownOrigins(req);
  const origin = req.headers.get('origin');
  if (origin !== null) {
    if (allowed.has(origin)) return;
    throw refuse(
      `Refused: this request came from another site (Origin ${origin}); changes are accepted only from Nodewright's own pages.`,
    );
  }
  const referer = req.headers.get('referer');
  if (referer !== null) {
    const from = originOf(referer);
    if (from !== null && allowed.has(from)) return;
    throw refuse(
      `Refused: this request came from another site (Referer ${from ?? 'unreadable'}); changes are accepted only from Nodewright's own pages.`,
    );
  }
  const type = (req.headers.get('content-type') ?? '').split(';')[0].trim().toLowerCase();
  if (FORM_CONTENT_TYPES.includes(type)) {
    throw refuse(
      `Refused: a ${type} request without an Origin header looks like a form posted from another site; send an Origin header naming this server.`,
    );
  }
}

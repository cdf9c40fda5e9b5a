import { NextResponse, type NextRequest } from 'next/server';
import { newCspNonce, pageContentSecurityPolicy } from '@/lib/edge/page-content-security-policy';

/**
 * Pages only: a Content-Security-Policy with a fresh nonce per request.
 *
 * The API is deliberately not matched. For a request with a body that a proxy
 * runs on, Next clones the body for the proxy and waits for all of it to
 * arrive before the route runs, which would undo the API's size limits
 * (lib/api/request-body.ts). The API's own checks (origin, media type, size)
 * live in its route-handler wrappers (lib/api/route-handler.ts); its static
 * security headers come from next.config.mjs.
 */
export function proxy(request: NextRequest) {
  const nonce = newCspNonce();
  const policy = pageContentSecurityPolicy(nonce);
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('content-security-policy', policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('content-security-policy', policy);
  return response;
}

export const config = {
  matcher: [
    {
      source: '/((?!api/|_next/static|_next/image|favicon.ico|fonts/).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};

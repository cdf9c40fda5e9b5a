/**
 * The Content-Security-Policy of every page, with a fresh nonce per request
 * (Next.js guide "Content Security Policy", nonce pattern: proxy.ts puts the
 * policy on the request, Next reads the nonce from it and sets it on its own
 * scripts; pages therefore render per request).
 *
 * - script-src: only scripts carrying this response's nonce, and what they
 *   load ('strict-dynamic' lets Next's runtime load its chunks). No inline
 *   script without the nonce and no eval: the figures evaluate Vega
 *   expressions with vega-interpreter instead of `new Function`.
 *   Development builds add 'unsafe-eval', which React's dev tooling needs.
 * - style-src 'unsafe-inline': React's `style` props, Tiptap's node views and
 *   Vega's SVG set style attributes, which a nonce cannot cover (and a nonce
 *   in style-src would switch 'unsafe-inline' off). Stylesheets come from
 *   'self' only.
 * - frame-ancestors 'none': no other page may frame Nodewright (clickjacking);
 *   X-Frame-Options: DENY in next.config.mjs says the same to older browsers.
 */
export function pageContentSecurityPolicy(nonce: string, development = process.env.NODE_ENV === 'development'): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** 128 random bits, base64: unguessable and fresh per response. */
export function newCspNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return Buffer.from(bytes).toString('base64');
}

/** How the allow-list reads in messages. */
export const LINK_SCHEMES_ALLOWED = 'http, https, mailto and #anchor';

/**
 * Whether a link target may stay a link in a memo and its PDF: http(s) URLs,
 * mailto addresses and anchors inside the document (`#section-2`). Anything
 * else — `javascript:`, `data:`, `file:`, relative paths, or a scheme disguised
 * with control characters or spaces, which browsers strip before reading the
 * scheme (WHATWG URL Standard, "basic URL parser": leading/trailing C0 controls
 * and spaces, and tab or newline anywhere, are removed) — is refused.
 */
export function isAllowedLinkHref(href: unknown): href is string {
  if (typeof href !== 'string' || href.length === 0 || href.length > 2048) return false;
  // No C0 control characters, DEL or spaces anywhere: a plain URL never needs them raw.
  if (/[\u0000-\u0020\u007f]/.test(href)) return false;
  if (href.startsWith('#')) return href.length > 1;
  const scheme = /^([A-Za-z][A-Za-z0-9+.-]*):/.exec(href)?.[1]?.toLowerCase();
  if (scheme === 'mailto') return href.length > 'mailto:'.length;
  if (scheme !== 'http' && scheme !== 'https') return false;
  try {
    const url = new URL(href);
    return (url.protocol === 'http:' || url.protocol === 'https:') && url.hostname.length > 0;
  } catch {
    return false;
  }
}

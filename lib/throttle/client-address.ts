import { integerSetting } from '@/lib/mail/mail-config';

/**
 * The header through which Nodewright's own HTTP server (scripts/support/serve-app.ts)
 * passes the TCP peer address of each request to the app. The server sets it
 * on every request, overwriting whatever a client sent under that name.
 */
export const PEER_ADDRESS_HEADER = 'x-nodewright-peer-address';

/** Bucket for requests whose peer is unknown (the app served by `next dev` or `next start` directly). */
export const UNKNOWN_ADDRESS = 'unknown';

type HeaderSource = Headers | Record<string, string | string[] | undefined>;

function header(headers: HeaderSource, name: string): string | undefined {
  if (headers instanceof Headers) return headers.get(name) ?? undefined;
  const v = headers[name];
  return Array.isArray(v) ? v.join(', ') : v;
}

/** IPv4-mapped IPv6 (`::ffff:127.0.0.1`) is the IPv4 address; anything else is kept as text, shortened. */
function normalise(address: string): string {
  const a = address.trim().toLowerCase();
  return (a.startsWith('::ffff:') && a.includes('.') ? a.slice(7) : a).slice(0, 64) || UNKNOWN_ADDRESS;
}

/**
 * The client's address for throttling and the session record.
 *
 * By default (`NODEWRIGHT_TRUSTED_PROXY_HOPS=0`) it is the TCP peer of the
 * connection and `X-Forwarded-For` is ignored, since any client can send it.
 * Behind N reverse proxies that each append the address they received from
 * (nginx `$proxy_add_x_forwarded_for`, most load balancers), set the variable
 * to N: the address is then the N-th entry from the right of
 * `X-Forwarded-For`, the one written by the outermost trusted proxy; entries
 * further left were written by the client and are not believed.
 */
export function clientAddress(headers: HeaderSource): string {
  const hops = integerSetting('NODEWRIGHT_TRUSTED_PROXY_HOPS', 0, 0, 10);
  const peer = header(headers, PEER_ADDRESS_HEADER);
  if (hops > 0) {
    const chain = (header(headers, 'x-forwarded-for') ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
    if (chain.length >= hops) return normalise(chain[chain.length - hops]);
  }
  return peer ? normalise(peer) : UNKNOWN_ADDRESS;
}

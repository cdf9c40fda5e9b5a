/**
 * Serves the built app (what `next start` does) through Nodewright's own
 * HTTP server, for three reasons:
 * - it listens on HOST (default 127.0.0.1, loopback only) and PORT;
 * - it stamps each request with the connection's TCP peer address
 *   (PEER_ADDRESS_HEADER, overwriting any client-sent value), the only
 *   address a route handler can trust when no proxy is configured: Next's own
 *   server passes a client's `X-Forwarded-For` through unchanged, and route
 *   handlers cannot see the socket. lib/throttle/client-address.ts reads it;
 * - it bounds request bodies before Next reads them (lib/edge/limit-request-body.ts).
 * Started by scripts/start.ts after migration and build.
 */
import http from 'node:http';
import next from 'next';
import { PEER_ADDRESS_HEADER } from '../../lib/throttle/client-address';
import { limitRequestBody } from '../../lib/edge/limit-request-body';

async function main() {
  const port = Number(process.env.PORT ?? '3000');
  const host = process.env.HOST?.trim() || '127.0.0.1';
  const app = next({ dev: false, dir: process.cwd(), hostname: host, port });
  const handle = app.getRequestHandler();
  await app.prepare();
  const server = http.createServer((req, res) => {
    req.headers[PEER_ADDRESS_HEADER] = req.socket.remoteAddress ?? '';
    if (!limitRequestBody(req, res)) return;
    handle(req, res).catch((err: unknown) => {
      console.error('[nodewright] request failed', err);
      if (!res.headersSent) res.writeHead(500).end();
    });
  });
  server.on('error', (err) => {
    console.error(`[nodewright] cannot listen on ${host}:${port}:`, err.message);
    process.exit(1);
  });
  server.listen(port, host, () => console.log(`[nodewright] listening on ${host}:${port}`));
  const stop = () => server.close(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err) => {
  console.error('[nodewright] could not serve:', err instanceof Error ? err.message : err);
  process.exit(1);
});

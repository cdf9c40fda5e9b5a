import type { IncomingMessage, ServerResponse } from 'node:http';
import { toErrorBody } from '@/lib/api/errors';
import { declaredContentLength, JSON_BODY_MAX_BYTES, tooLarge } from '@/lib/api/request-body';
import { MAX_UPLOAD_BODY_BYTES } from '@/lib/attachments/upload-limits';

/**
 * Request-body bounds at Nodewright's own HTTP server (scripts/support/serve-app.ts),
 * in front of Next.
 *
 * Routes refuse a body over their own limit (lib/api/request-body.ts), but they
 * cannot bound what the server holds: Next turns the request into a web
 * stream by reading the socket to its end as fast as the client sends, with
 * no backpressure (`requestToBodyStream` in next/dist/server/body-streams.js,
 * Next 16), whether or not the route ever reads it — also after the route has
 * answered. A client could so make the server hold any amount. Two bounds:
 *
 * - A declared Content-Length over the largest body any route accepts is
 *   answered 413 here, before Next sees the request. Node then reads and
 *   discards the rest of the body (IncomingMessage `_dump`) instead of keeping
 *   it. The connection is deliberately not closed at once: closing a socket
 *   with unread bytes in it sends a TCP reset (RFC 1122, 4.2.2.13), which can
 *   destroy the 413 before the client has read it; the client would see a
 *   broken connection instead of the reason. After DISCARD_GRACE_MS a body
 *   still arriving is cut off.
 * - A body streamed without a length (chunked) is counted as Node's parser
 *   hands it over; past `cutOffBytes` the connection is closed. The cut-off is
 *   twice the largest route limit, so that a route counting the same stream
 *   (which reads behind Next) has refused with its own 413 first.
 */

/** The largest body any route accepts, in bytes: JSON bodies, the image upload, next-auth's form (64 KiB). */
export const LARGEST_ROUTE_BODY_BYTES = Math.max(JSON_BODY_MAX_BYTES, MAX_UPLOAD_BODY_BYTES);

/** Where a streamed body is cut off, in bytes. */
export const STREAMED_BODY_CUT_OFF_BYTES = 2 * LARGEST_ROUTE_BODY_BYTES;

/** How long a body refused by its declared length is read and discarded after the 413 has been sent, in ms. */
const DISCARD_GRACE_MS = 2000;

/**
 * Applies both bounds to one request. Returns false when it has already
 * answered (declared length too large): the request must then not go on to Next.
 */
export function limitRequestBody(
  req: IncomingMessage,
  res: ServerResponse,
  limits: { largestBodyBytes: number; cutOffBytes: number } = {
    largestBodyBytes: LARGEST_ROUTE_BODY_BYTES,
    cutOffBytes: STREAMED_BODY_CUT_OFF_BYTES,
  },
): boolean {
  const declared = declaredContentLength(req.headers['content-length']);
  if (declared !== null && declared > limits.largestBodyBytes) {
    const { status, body } = toErrorBody(tooLarge(limits.largestBodyBytes, 'request body', 'this server'));
    res.writeHead(status, {
      'content-type': 'application/json; charset=utf-8',
      'cache-control': 'no-store',
      'x-content-type-options': 'nosniff',
    });
    res.end(JSON.stringify(body));
    // Discarding costs only bandwidth, but not for ever: once the client has had time to read the answer, a body
    // still arriving ends with the connection.
    res.once('finish', () => {
      setTimeout(() => {
        if (!req.complete) req.socket.destroy();
      }, DISCARD_GRACE_MS).unref();
    });
    return false;
  }
  // Node's HTTP parser delivers each piece of the body through the request's `push` (lib/_http_common.js,
  // parserOnBody); counting there sees every byte before anyone buffers it, without changing how the stream flows.
  const push = req.push.bind(req);
  let receivedBytes = 0;
  req.push = (chunk: unknown, encoding?: BufferEncoding) => {
    if (chunk !== null && chunk !== undefined) {
      receivedBytes += (chunk as Buffer).length;
      if (receivedBytes > limits.cutOffBytes) {
        // No route accepts this much; whatever it answered is sent or moot. Stop taking bytes from the client.
        req.socket.destroy();
        return false;
      }
    }
    return push(chunk, encoding);
  };
  return true;
}

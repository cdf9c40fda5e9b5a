import http from 'node:http';

/**
 * Sends a large request body chunk by chunk, respecting backpressure, and
 * stops as soon as the server answers. `bytesSent` says how much of the body
 * had been handed to the socket when the answer came: a server that answers
 * before reading the whole body leaves it well below `totalBytes`.
 */
export interface StreamedAnswer {
  status: number;
  body: Record<string, unknown> | null;
  bytesSent: number;
  totalBytes: number;
  /**
   * The server closed the connection before its whole answer could be read: it refused the body and closed
   * while we were still writing (EPIPE / ECONNRESET). Only a server that stops reading does that. `status`
   * is the answer's status when its status line arrived before the reset, else 0.
   */
  reset: boolean;
}

export function streamRequest(
  url: string,
  opts: {
    method?: string;
    headers: Record<string, string>;
    totalBytes: number;
    chunk: Buffer;
    prefix?: Buffer;
    declareLength?: boolean;
  },
): Promise<StreamedAnswer> {
  return new Promise((resolve, reject) => {
    const prefix = opts.prefix ?? Buffer.alloc(0);
    const headers: Record<string, string> = { ...opts.headers };
    if (opts.declareLength) headers['content-length'] = String(opts.totalBytes);
    const req = http.request(url, { method: opts.method ?? 'POST', headers });
    let bytesSent = 0;
    let answered = false;
    req.on('response', (res) => {
      answered = true;
      const sentAtAnswer = bytesSent;
      const chunks: Buffer[] = [];
      let ended = false;
      res.on('data', (c: Buffer) => chunks.push(c));
      // A server that closes a connection with unread request bytes in its socket sends a TCP reset (RFC 1122,
      // 4.2.2.13), and the reset can drop the rest of an answer whose status line already arrived: the response
      // then closes without 'end'. Its status is known, its body is not.
      res.on('error', () => {});
      res.on('close', () => {
        if (ended) return;
        resolve({
          status: res.statusCode ?? 0,
          body: null,
          bytesSent: sentAtAnswer,
          totalBytes: opts.totalBytes,
          reset: true,
        });
      });
      res.on('end', () => {
        ended = true;
        req.destroy();
        const text = Buffer.concat(chunks).toString('utf8');
        let body: Record<string, unknown> | null = null;
        try {
          body = text ? (JSON.parse(text) as Record<string, unknown>) : null;
        } catch {
          body = { raw: text };
        }
        resolve({
          status: res.statusCode ?? 0,
          body,
          bytesSent: sentAtAnswer,
          totalBytes: opts.totalBytes,
          reset: false,
        });
      });
    });
    let stopped = false;
    req.on('error', (err: NodeJS.ErrnoException) => {
      // After the answer the server may close the connection while we still write; that is expected.
      if (answered) return;
      // A server that refuses a body answers and closes the connection; our next write can fail (EPIPE,
      // ECONNRESET) before the answer has been parsed. Stop writing and give the answer a moment to arrive; without
      // one, say so (`reset`) rather than fail: the refusal happened, only its answer was lost in the race.
      if (err.code === 'EPIPE' || err.code === 'ECONNRESET') {
        stopped = true;
        setTimeout(() => {
          if (!answered) resolve({ status: 0, body: null, bytesSent, totalBytes: opts.totalBytes, reset: true });
        }, 2000);
        return;
      }
      reject(err);
    });
    const write = () => {
      while (!answered && !stopped && bytesSent < opts.totalBytes) {
        const piece =
          bytesSent === 0 && prefix.length > 0
            ? prefix
            : opts.chunk.subarray(0, Math.min(opts.chunk.length, opts.totalBytes - bytesSent));
        bytesSent += piece.length;
        if (!req.write(piece)) {
          req.once('drain', write);
          return;
        }
      }
      if (!answered && !stopped && bytesSent >= opts.totalBytes) req.end();
    };
    write();
  });
}

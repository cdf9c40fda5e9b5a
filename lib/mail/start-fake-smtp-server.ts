import fs from 'node:fs';
import path from 'node:path';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { dataDir } from '@/lib/config/data-dir';
import { storeReceivedMessage } from './store-received-message';
import { mailConfig } from './mail-config';

/** Largest message the built-in server accepts (RFC 1870 SIZE is announced to clients). */
const MAX_MESSAGE_BYTES = 50 * 1024 * 1024;

export interface RunningSmtpServer {
  host: string;
  port: number;
  close: () => Promise<void>;
}

type Holder = { server?: RunningSmtpServer; starting?: Promise<RunningSmtpServer> };
const holder = globalThis as unknown as { __nodewrightFakeSmtp?: Holder };

/** The built-in server of this process, if one is running (the mailer sends to it when SMTP_URL is unset). */
export function runningFakeSmtpServer(): RunningSmtpServer | undefined {
  return holder.__nodewrightFakeSmtp?.server;
}

/** Where the port of the built-in server is written for tools and tests that run beside the app. */
export function fakeSmtpPortFile(): string {
  return path.join(dataDir(), 'fake-smtp-port');
}

function listen(server: SMTPServer, port: number, host: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once('error', onError);
    server.listen(port, host, () => {
      server.off('error', onError);
      const addr = server.server.address();
      resolve(typeof addr === 'object' && addr ? addr.port : port);
    });
  });
}

function readStream(stream: SMTPServerDataStream): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    stream.on('data', (c: Buffer) => chunks.push(c));
    stream.on('end', () => resolve(Buffer.concat(chunks)));
    stream.on('error', reject);
  });
}

/**
 * A local SMTP server (npm smtp-server) on a loopback port that keeps every
 * message it accepts in the outbox tables. It tries NODEWRIGHT_FAKE_SMTP_PORT
 * (default 2525); when the default is taken by another instance it listens on
 * a free port instead. A message that cannot be stored is answered with a
 * temporary failure (451), so the sender records the failure and retries.
 */
export async function startFakeSmtpServer(opts: { port?: number; host?: string } = {}): Promise<RunningSmtpServer> {
  const h = (holder.__nodewrightFakeSmtp ??= {});
  if (h.server) return h.server;
  h.starting ??= (async () => {
    const host = opts.host ?? '127.0.0.1';
    const configured = opts.port !== undefined ? { port: opts.port, explicit: true } : mailConfig().fakeSmtpPort;
    const server = new SMTPServer({
      banner: 'Nodewright local outbox',
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: MAX_MESSAGE_BYTES,
      logger: false,
      onData(
        stream: SMTPServerDataStream,
        session: SMTPServerSession,
        callback: (err?: Error | null, message?: string) => void,
      ) {
        readStream(stream)
          .then(async (raw) => {
            if (stream.sizeExceeded) {
              callback(Object.assign(new Error('Message exceeds the size limit'), { responseCode: 552 }));
              return;
            }
            const from = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
            const id = await storeReceivedMessage(raw, { from, to: session.envelope.rcptTo.map((r) => r.address) });
            callback(null, `Stored as outbox message ${id}`);
          })
          .catch((err: unknown) => {
            console.error('[nodewright] the local SMTP server could not store a message', err);
            callback(Object.assign(new Error('Local outbox unavailable, try again later'), { responseCode: 451 }));
          });
      },
    });
    let port: number;
    try {
      port = await listen(server, configured.port, host);
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || configured.explicit) throw err;
      port = await listen(server, 0, host);
    }
    server.on('error', (err: Error) => console.error('[nodewright] local SMTP server error', err.message));
    fs.writeFileSync(fakeSmtpPortFile(), `${port}\n`);
    const running: RunningSmtpServer = {
      host,
      port,
      close: () =>
        new Promise<void>((resolve) => {
          server.close(() => resolve());
          if (holder.__nodewrightFakeSmtp?.server === running) holder.__nodewrightFakeSmtp = {};
        }),
    };
    h.server = running;
    return running;
  })();
  try {
    return await h.starting;
  } finally {
    h.starting = undefined;
  }
}

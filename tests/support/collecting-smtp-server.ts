import { SMTPServer } from 'smtp-server';
import { simpleParser, type ParsedMail } from 'mailparser';

/**
 * An SMTP server (npm smtp-server) owned by a test, on a loopback port that
 * stays the same across stop and start, keeping every message it accepts in
 * `received`: app instances sending through SMTP_URL to it can be shown the
 * server going down and coming back, and every message they hand over is
 * counted.
 */
export class CollectingSmtpServer {
  readonly received: ParsedMail[] = [];
  private server: SMTPServer | null = null;
  constructor(readonly port: number) {}

  get url(): string {
    return `smtp://127.0.0.1:${this.port}`;
  }

  start(): Promise<void> {
    return new Promise((resolve) => {
      this.server = new SMTPServer({
        authOptional: true,
        disabledCommands: ['AUTH', 'STARTTLS'],
        logger: false,
        onData: (stream, _session, callback) => {
          simpleParser(stream).then((m) => {
            this.received.push(m);
            callback();
          }, callback);
        },
      });
      this.server.listen(this.port, '127.0.0.1', () => resolve());
    });
  }

  stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    return new Promise((resolve) => (server ? server.close(() => resolve()) : resolve()));
  }
}

import fs from 'node:fs';
import nodemailer from 'nodemailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';
import { mailConfig } from './mail-config';
import { fakeSmtpPortFile, runningFakeSmtpServer } from './start-fake-smtp-server';

export interface OutgoingMail {
  to: { name: string; address: string };
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

/** Accepted: the SMTP server answered 250 to the end of DATA (RFC 5321 §4.1.1.4). */
export type SendOutcome = { ok: true; messageId: string; response: string } | { ok: false; error: string };

function transportOptions(): SMTPTransport.Options {
  const { smtpUrl } = mailConfig();
  if (smtpUrl) return { url: smtpUrl };
  let port = runningFakeSmtpServer()?.port;
  if (port === undefined) {
    const file = fakeSmtpPortFile();
    if (fs.existsSync(file)) port = Number(fs.readFileSync(file, 'utf8').trim());
  }
  if (!port) throw new Error('No SMTP server: set SMTP_URL, or start the app so that its local SMTP server runs.');
  return { host: '127.0.0.1', port, secure: false, ignoreTLS: true };
}

/** Short, secret-free words for an SMTP failure (nodemailer error code, reply code and text). */
export function describeSmtpError(err: unknown): string {
  if (!(err instanceof Error)) return 'unknown SMTP failure';
  const e = err as Error & { code?: string; responseCode?: number; response?: string };
  const parts = [e.code, e.responseCode ? String(e.responseCode) : undefined, e.response ?? e.message].filter(Boolean);
  return parts.join(' ').slice(0, 1000);
}

/**
 * Sends one message with nodemailer over SMTP (SMTP_URL, or the built-in
 * server). Never throws: the outcome says whether the server accepted it.
 */
export async function sendMail(mail: OutgoingMail): Promise<SendOutcome> {
  try {
    const options = transportOptions();
    const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };
    const transport = nodemailer.createTransport({ ...options, ...timeouts });
    try {
      const info = await transport.sendMail({
        from: mailConfig().from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        attachments: mail.attachments,
      });
      if (info.rejected.length > 0)
        return { ok: false, error: `refused recipient ${info.rejected.map(String).join(', ')}: ${info.response}` };
      return { ok: true, messageId: info.messageId, response: info.response };
    } finally {
      transport.close();
    }
  } catch (err) {
    return { ok: false, error: describeSmtpError(err) };
  }
}

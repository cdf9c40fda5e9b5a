import type { OutgoingMail } from '@/lib/mail/send-mail';
import { pdfFileName } from '@/lib/pdf/pdf-file-name';
import { formatDateTime } from '@/lib/format/format-date';

export interface ReleaseMessageInput {
  to: { name: string; email: string };
  documentNumber: string;
  title: string;
  letter: string;
  changeSummary: string;
  coverNote: string;
  releasedBy: string;
  pdfSha256: string;
  pdf: { bytes: Buffer; attach: boolean; limitBytes: number };
  link: string;
  linkExpiresAt: Date;
}

export const escapeHtml = (s: string): string =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

const kib = (n: number) => `${Math.ceil(n / 1024)} KiB`;

/** The release notice: cover note, revision letter, change summary, PDF digest and the one-time link; the PDF attached when small enough. */
export function composeReleaseMessage(m: ReleaseMessageInput): OutgoingMail {
  const filename = pdfFileName({ documentNumber: m.documentNumber, revisionLetter: m.letter });
  const pdfLine = m.pdf.attach
    ? `The PDF of revision ${m.letter} is attached (${filename}, ${kib(m.pdf.bytes.length)}).`
    : `The PDF (${kib(m.pdf.bytes.length)}) is larger than the ${kib(m.pdf.limitBytes)} this server attaches; download it through the link.`;
  const text = [
    `Dear ${m.to.name},`,
    '',
    `${m.releasedBy} has released revision ${m.letter} of ${m.documentNumber} "${m.title}" to you.`,
    '',
    m.coverNote,
    '',
    `Change summary of revision ${m.letter}: ${m.changeSummary}`,
    '',
    pdfLine,
    `SHA-256 of the PDF: ${m.pdfSha256}`,
    '',
    `Open the revision (the link works once, until ${formatDateTime(m.linkExpiresAt.toISOString())}):`,
    m.link,
    '',
    'After that, sign in to see every revision released to you and to acknowledge receipt.',
  ].join('\n');
  const html = `<!doctype html><html><body style="font-family: sans-serif; color: #1d2430; line-height: 1.5">
<p>Dear ${escapeHtml(m.to.name)},</p>
<p>${escapeHtml(m.releasedBy)} has released <strong>revision ${escapeHtml(m.letter)}</strong> of <strong>${escapeHtml(m.documentNumber)}</strong> “${escapeHtml(m.title)}” to you.</p>
<blockquote style="border-left: 3px solid #d9d6cc; margin: 0; padding-left: 12px; white-space: pre-wrap">${escapeHtml(m.coverNote)}</blockquote>
<p><strong>Change summary of revision ${escapeHtml(m.letter)}:</strong> ${escapeHtml(m.changeSummary)}</p>
<p>${escapeHtml(pdfLine)}<br><span style="font-family: monospace; font-size: 12px">SHA-256 ${escapeHtml(m.pdfSha256)}</span></p>
<p><a href="${escapeHtml(m.link)}" style="background: #2f4a7a; color: #fff; padding: 6px 12px; border-radius: 4px; text-decoration: none">Open revision ${escapeHtml(m.letter)}</a></p>
<p style="font-size: 12px; color: #4a5262">The link works once, until ${escapeHtml(formatDateTime(m.linkExpiresAt.toISOString()))}. After that, sign in to see every revision released to you and to acknowledge receipt.</p>
</body></html>`;
  return {
    to: { name: m.to.name, address: m.to.email },
    subject: `Revision ${m.letter} of ${m.documentNumber} released: ${m.title}`,
    text,
    html,
    attachments: m.pdf.attach ? [{ filename, content: m.pdf.bytes, contentType: 'application/pdf' }] : undefined,
  };
}

import type { OutgoingMail } from '@/lib/mail/send-mail';
import { formatDateTime } from '@/lib/format/format-date';
import { escapeHtml } from './compose-release-message';

/** Invitation to a customer account, or a password reset: one paragraph, one one-time link. */
export function composeAccountMessage(
  kind: 'invitation' | 'password-reset',
  m: { to: { name: string; email: string }; link: string; expiresAt: Date; invitedBy?: string; organisation?: string },
): OutgoingMail {
  const until = formatDateTime(m.expiresAt.toISOString());
  const lead =
    kind === 'invitation'
      ? `${m.invitedBy ?? 'A configuration manager'} has invited you to receive design memos through Nodewright. Choose your name and password to open your account:`
      : 'Someone asked to reset the password of your Nodewright account. If it was you, choose a new password here; otherwise ignore this message:';
  const subject = kind === 'invitation' ? 'Your invitation to Nodewright' : 'Reset your Nodewright password';
  return {
    to: { name: m.to.name, address: m.to.email },
    subject,
    text: [`Dear ${m.to.name},`, '', lead, m.link, '', `The link works once, until ${until}.`].join('\n'),
    html: `<!doctype html><html><body style="font-family: sans-serif; color: #1d2430; line-height: 1.5"><p>Dear ${escapeHtml(m.to.name)},</p><p>${escapeHtml(lead)}</p><p><a href="${escapeHtml(m.link)}">${escapeHtml(m.link)}</a></p><p style="font-size: 12px; color: #4a5262">The link works once, until ${escapeHtml(until)}.</p></body></html>`,
  };
}

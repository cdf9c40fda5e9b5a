import type { OutgoingMail } from '@/lib/mail/send-mail';
import { escapeHtml } from '@/lib/delivery/compose-release-message';
import type { WorkflowNotificationKind } from './notification-kinds';

export interface NotificationMessageInput {
  kind: WorkflowNotificationKind;
  to: { name: string; email: string };
  actorName: string;
  memo: { documentNumber: string; title: string };
  revisionLetter: string | null;
  note: string | null;
  /** The memo page in the app. */
  link: string;
  /** The signed-in person's notification settings page. */
  settingsLink: string;
}

/** What happened, in one sentence, and what the note is called. */
function describe(m: NotificationMessageInput): { subject: string; sentence: string; noteLabel: string } {
  const doc = `${m.memo.documentNumber} "${m.memo.title}"`;
  const rev = m.revisionLetter ?? '';
  switch (m.kind) {
    case 'submitted':
      return {
        subject: `For your review: ${m.memo.documentNumber} ${m.memo.title}`,
        sentence: `${m.actorName} submitted ${doc} to you for review.`,
        noteLabel: 'Submit note',
      };
    case 'changes-requested':
      return {
        subject: `Changes requested: ${m.memo.documentNumber} ${m.memo.title}`,
        sentence: `${m.actorName} requested changes to ${doc}; it is back in draft.`,
        noteLabel: 'What should change',
      };
    case 'approved':
      return {
        subject: `Approved: ${m.memo.documentNumber} ${m.memo.title}`,
        sentence: `${doc} is approved (last decision by ${m.actorName}) and can be frozen.`,
        noteLabel: 'Reviewer’s note',
      };
    case 'frozen':
      return {
        subject: `Frozen as revision ${rev}: ${m.memo.documentNumber} ${m.memo.title}`,
        sentence: `${m.actorName} froze ${doc} as revision ${rev}.`,
        noteLabel: 'Change summary',
      };
    case 'released':
      return {
        subject: `Revision ${rev} released to customers: ${m.memo.documentNumber} ${m.memo.title}`,
        sentence: `${m.actorName} released revision ${rev} of ${doc} to customers.`,
        noteLabel: 'Cover note',
      };
  }
}

/** The e-mail of a workflow notification: what happened, the note, a link to the memo, and where to switch such mail off. */
export function composeNotificationMessage(m: NotificationMessageInput): OutgoingMail {
  const { subject, sentence, noteLabel } = describe(m);
  const text = [
    `Dear ${m.to.name},`,
    '',
    sentence,
    ...(m.note ? ['', `${noteLabel}:`, m.note] : []),
    '',
    `Open the memo: ${m.link}`,
    '',
    `You get this mail because of your part in this memo. Choose which mail you receive: ${m.settingsLink}`,
  ].join('\n');
  const html = `<!doctype html><html><body style="font-family: sans-serif; color: #1d2430; line-height: 1.5">
<p>Dear ${escapeHtml(m.to.name)},</p>
<p>${escapeHtml(sentence)}</p>
${m.note ? `<p><strong>${escapeHtml(noteLabel)}:</strong></p>\n<blockquote style="border-left: 3px solid #d9d6cc; margin: 0; padding-left: 12px; white-space: pre-wrap">${escapeHtml(m.note)}</blockquote>` : ''}
<p><a href="${escapeHtml(m.link)}">Open ${escapeHtml(m.memo.documentNumber)}</a></p>
<p style="font-size: 12px; color: #4a5262">You get this mail because of your part in this memo. <a href="${escapeHtml(m.settingsLink)}">Choose which mail you receive</a>.</p>
</body></html>`;
  return { to: { name: m.to.name, address: m.to.email }, subject, text, html };
}

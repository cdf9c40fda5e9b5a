import { isRole, ROLE_LABELS } from '@/lib/auth/roles';
import { formatDateTime } from '@/lib/format/format-date';
import type { AuditAction } from './record-audit';

/** What a sentence about an audit event needs: the event, and the names its ids stand for. */
export interface DescribableEvent {
  action: string;
  actorName: string | null;
  actorEmail: string | null;
  documentNumber: string | null;
  memoId: number | null;
  revisionLetter: string | null;
  details: Record<string, unknown> | null;
}

type Phrase = (e: DescribableEvent, d: Details) => string;

/** Typed reads of an event's details (stored JSON: anything may be missing or of another type). */
class Details {
  constructor(private readonly raw: Record<string, unknown>) {}
  text(key: string): string | null {
    const v = this.raw[key];
    return typeof v === 'string' && v.trim() !== '' ? v : typeof v === 'number' ? String(v) : null;
  }
  num(key: string): number | null {
    const v = this.raw[key];
    return typeof v === 'number' && Number.isFinite(v) ? v : null;
  }
  has(key: string): boolean {
    return this.raw[key] !== undefined && this.raw[key] !== null;
  }
  flag(key: string): boolean {
    return this.raw[key] === true;
  }
  list(key: string): string[] {
    const v = this.raw[key];
    return Array.isArray(v) ? v.filter((x): x is string => typeof x === 'string') : [];
  }
  /** `: “text”` when the key holds text, else nothing. */
  quoted(key: string): string {
    const t = this.text(key);
    return t ? `: “${t}”` : '';
  }
}

const who = (e: DescribableEvent) => e.actorName ?? e.actorEmail ?? 'Someone';
const doc = (e: DescribableEvent) => e.documentNumber ?? (e.memoId ? `memo ${e.memoId}` : 'a memo');
const rev = (e: DescribableEvent) => (e.revisionLetter ? `${doc(e)} revision ${e.revisionLetter}` : doc(e));
const names = (xs: string[]) =>
  xs.length === 0 ? 'nobody' : xs.length === 1 ? xs[0] : `${xs.slice(0, -1).join(', ')} and ${xs.at(-1)}`;
const shortSha = (d: Details) => {
  const sha = d.text('pdfSha256');
  return sha ? ` (SHA-256 ${sha.slice(0, 12)}…)` : '';
};
const SIGNED_VERB: Record<string, string> = {
  approve: 'approval',
  'request-changes': 'request for changes',
  freeze: 'freeze',
};

const PHRASES: Record<AuditAction, Phrase> = {
  'sign-in': (e, d) => `${who(e)} signed in${d.text('via') === 'delivery link' ? ' with a delivery link' : ''}.`,
  'sign-in-refused': (_e, d) =>
    `A sign-in as ${d.text('email') ?? 'an unknown address'} was refused: wrong password${d.text('clientAddress') ? ` (from ${d.text('clientAddress')})` : ''}.`,
  'sign-in-throttled': (_e, d) =>
    `Sign-in as ${d.text('email') ?? 'an unknown address'} was blocked after too many wrong passwords${d.text('retryAt') ? ` until ${d.text('retryAt')}` : ''}.`,
  'sign-out': (e) => `${who(e)} signed out.`,
  'sessions.end': (e, d) =>
    `${who(e)} signed ${d.text('email') ?? 'a person'} out everywhere (${d.num('sessionsEnded') ?? 0} session${d.num('sessionsEnded') === 1 ? '' : 's'} ended).`,
  'memo.create': (e, d) =>
    `${who(e)} created ${d.text('documentNumber') ?? doc(e)}${d.text('templateId') ? ` from the template ${d.text('templateId')}` : ''}.`,
  'memo.save': (e, d) => `${who(e)} saved ${doc(e)} as version ${d.num('version') ?? '?'}.`,
  'memo.submit': (e, d) =>
    `${who(e)} submitted ${doc(e)} version ${d.num('version') ?? '?'} for review to ${names(d.list('reviewers'))}${d.quoted('note')}.`,
  'memo.approve': (e, d) =>
    `${who(e)} approved ${doc(e)} version ${d.num('version') ?? '?'} (review round ${d.num('round') ?? '?'})${d.quoted('note')}.`,
  'memo.request-changes': (e, d) =>
    `${who(e)} requested changes to ${doc(e)} version ${d.num('version') ?? '?'} (review round ${d.num('round') ?? '?'})${d.quoted('note')}.`,
  'memo.freeze': (e, d) =>
    `${who(e)} froze ${rev(e)} from version ${d.num('memoVersion') ?? '?'}${shortSha(d)}${d.quoted('changeSummary')}.`,
  'memo.reopen': (e, d) => `${who(e)} reopened ${doc(e)} as a new draft${d.quoted('note')}.`,
  'memo.co-authors': (e, d) =>
    `${who(e)} changed the co-authors of ${doc(e)}: added ${names(d.list('added'))}, removed ${names(d.list('removed'))}.`,
  'revision.reverify': (e, d) =>
    `${who(e)} re-verified ${rev(e)} with engine ${d.text('engineVersion') ?? '?'}: ${d.num('differences') ?? 0} of ${d.num('checkedOutputs') ?? 0} outputs differ, ${d.num('failures') ?? 0} failed.`,
  'pdf.download': (e, d) =>
    d.flag('draft')
      ? `${who(e)} downloaded the draft PDF of ${doc(e)} version ${d.num('version') ?? '?'}${shortSha(d)}.`
      : `${who(e)} downloaded the PDF of ${rev(e)}${shortSha(d)}.`,
  'user.create': (e, d) =>
    `${who(e)} added ${d.text('email') ?? 'a person'} as ${d.text('role') ?? 'a user'}${d.text('via') && d.text('via') !== 'admin' ? ` (by ${d.text('via')})` : ''}.`,
  'user.update': (e, d) => {
    if (d.has('notificationEmail')) return `${who(e)} changed their notification e-mail settings.`;
    const changed = d.list('changed');
    return `${who(e)} changed ${d.text('email') ?? 'a person'}: ${[...changed, ...(d.flag('passwordChanged') ? ['password'] : [])].join(', ') || 'nothing'}.`;
  },
  'comment.create': (e, d) =>
    `${who(e)} commented on ${doc(e)}${d.text('quote') ? ` at “${d.text('quote')}”` : ''}${d.quoted('excerpt')}.`,
  'comment.update': (e) => `${who(e)} changed a comment on ${doc(e)}.`,
  'comment.reply': (e, d) => `${who(e)} replied in a thread on ${doc(e)}${d.quoted('excerpt')}.`,
  'comment.resolve': (e, d) =>
    `${who(e)} resolved the thread on ${doc(e)}${d.text('quote') ? ` at “${d.text('quote')}”` : ''}.`,
  'comment.reopen': (e, d) =>
    `${who(e)} reopened the thread on ${doc(e)}${d.text('quote') ? ` at “${d.text('quote')}”` : ''}.`,
  'revision.release': (e, d) => `${who(e)} released ${rev(e)} to ${names(d.list('recipients'))}.`,
  'delivery.ack': (e) => `${who(e)} acknowledged receipt of ${rev(e)}.`,
  'distribution.add': (e, d) =>
    `${who(e)} added ${d.text('email') ?? 'a customer'} to the distribution list of ${doc(e)}${d.flag('invited') ? ' and invited them' : ''}.`,
  'distribution.remove': (e, d) =>
    `${who(e)} removed ${d.text('email') ?? 'a customer'} from the distribution list of ${doc(e)}.`,
  'delivery.sent': (_e, d) =>
    `The release message to ${d.text('to') ?? 'a recipient'} was accepted by the mail server (attempt ${d.num('attempt') ?? 1}${d.flag('pdfAttached') ? ', PDF attached' : ', link only'}).`,
  'delivery.failed': (_e, d) =>
    `The release message to ${d.text('to') ?? 'a recipient'} failed (attempt ${d.num('attempt') ?? 1}): ${d.text('error') ?? 'no reason given'}${d.text('nextAttemptAt') ? `; next attempt ${d.text('nextAttemptAt')}` : ''}.`,
  'delivery.resend': (e, d) => `${who(e)} sent the release of ${doc(e)} to ${d.text('to') ?? 'a recipient'} again.`,
  'delivery.open': (e, d) =>
    `${who(e)} opened ${rev(e)}${d.text('via') ? ` (${d.text('via') === 'link' ? 'delivery link' : d.text('via') === 'pdf' ? 'PDF' : d.text('via')})` : ''}.`,
  'delivery.link-refused': (_e, d) => `A delivery link was refused: ${d.text('reason') ?? 'unusable'}.`,
  'invitation.sent': (e, d) =>
    `The invitation to ${d.text('email') ?? 'a customer'}${e.actorName ? ` from ${e.actorName}` : ''} ${d.has('sent') && !d.flag('sent') ? `could not be sent (attempt ${d.num('attempt') ?? 1}): ${d.text('error') ?? 'no reason given'}` : `was sent (attempt ${d.num('attempt') ?? 1})`}.`,
  'invitation.accept': (e) => `${who(e)} accepted their invitation and chose a password.`,
  'password-reset.request': (_e, d) =>
    `A password reset was requested for ${d.text('email') ?? 'an address'}${d.text('reason') ? ` (no link sent: ${d.text('reason')})` : d.has('sent') ? (d.flag('sent') ? '; the link was sent' : `; the link could not be sent: ${d.text('error') ?? 'no reason given'}`) : ''}.`,
  'password-reset.throttled': (_e, d) =>
    `Password-reset requests for ${d.text('email') ?? 'an address'} were refused: too many.`,
  'password-reset.complete': (e, d) =>
    `${who(e)} set a new password with a reset link (${d.num('sessionsEnded') ?? 0} session${d.num('sessionsEnded') === 1 ? '' : 's'} ended).`,
  'signature.sign': (e, d) => {
    const role = d.text('role');
    const at = d.text('signedAt');
    return `${d.text('printedName') ?? who(e)}${role ? ` (${isRole(role) ? ROLE_LABELS[role] : role})` : ''} electronically signed the ${SIGNED_VERB[d.text('signedAction') ?? ''] ?? 'action'} of ${rev(e)} version ${d.num('version') ?? '?'}${d.text('meaning') ? `, meaning “${d.text('meaning')}”` : ''}${at ? `, at ${formatDateTime(at)}` : ''}.`;
  },
  'orbit-message.download': (e, d) => {
    const kind = d.text('kind');
    const sha = d.text('sha256');
    return `${who(e)} downloaded the ${kind ? kind.toUpperCase() : 'orbit data message'} of ${rev(e)}${sha ? ` (SHA-256 ${sha.slice(0, 12)}…)` : ''}.`;
  },
  'memo.restore': (e, d) =>
    `${who(e)} restored version ${d.num('restoredFrom') ?? '?'} of ${doc(e)} as version ${d.num('version') ?? '?'}.`,
  'memo.name-version': (e, d) => `${who(e)} named version ${d.num('version') ?? '?'} of ${doc(e)}${d.quoted('label')}.`,
  'organisation.update': (e) => `${who(e)} changed the issuing organisation printed on new PDFs.`,
  'signature.refused': (e) =>
    `${who(e)} tried to sign on ${doc(e)} with a wrong or missing password; nothing was signed.`,
  'signature.throttled': (e, d) =>
    `${who(e)} could not sign on ${doc(e)}: too many wrong passwords${d.text('retryAt') ? ` (blocked until ${d.text('retryAt')})` : ''}.`,
};

/** The name of each action in the trail's filter (every action needs one: the compiler checks). */
export const AUDIT_ACTION_LABELS: Record<AuditAction, string> = {
  'sign-in': 'Signed in',
  'sign-in-refused': 'Sign-in refused',
  'sign-in-throttled': 'Sign-in blocked (too many attempts)',
  'sign-out': 'Signed out',
  'sessions.end': 'Sessions ended',
  'memo.create': 'Memo created',
  'memo.save': 'Memo saved',
  'memo.submit': 'Sent to reviewers',
  'memo.approve': 'Approved',
  'memo.request-changes': 'Changes requested',
  'memo.freeze': 'Frozen as a revision',
  'memo.reopen': 'Reopened for editing',
  'memo.co-authors': 'Co-authors changed',
  'revision.reverify': 'Revision re-verified',
  'pdf.download': 'PDF downloaded',
  'user.create': 'Person added',
  'user.update': 'Person changed',
  'comment.create': 'Comment started',
  'comment.update': 'Comment edited',
  'comment.reply': 'Comment replied to',
  'comment.resolve': 'Comment resolved',
  'comment.reopen': 'Comment reopened',
  'revision.release': 'Revision released to customers',
  'delivery.ack': 'Receipt acknowledged',
  'distribution.add': 'Customer added to distribution',
  'distribution.remove': 'Customer removed from distribution',
  'delivery.sent': 'Delivery mail sent',
  'delivery.failed': 'Delivery mail failed',
  'delivery.resend': 'Delivery mail sent again',
  'delivery.open': 'Delivery opened',
  'delivery.link-refused': 'Delivery link refused',
  'invitation.sent': 'Invitation sent',
  'invitation.accept': 'Invitation accepted',
  'password-reset.request': 'Password reset asked for',
  'password-reset.throttled': 'Password reset blocked (too many requests)',
  'password-reset.complete': 'Password reset done',
  'organisation.update': 'Organisation settings changed',
  'signature.sign': 'Electronic signature',
  'signature.refused': 'Signature refused',
  'signature.throttled': 'Signature blocked (too many wrong passwords)',
  'orbit-message.download': 'Orbit message downloaded',
  'memo.restore': 'Older version restored',
  'memo.name-version': 'Version named',
};

/** One readable sentence for an audit event (the trail stores structured details; people read this). */
export function describeAuditEvent(e: DescribableEvent): string {
  const d = new Details(e.details ?? {});
  const phrase = (PHRASES as Record<string, Phrase | undefined>)[e.action];
  // A sentence ending in a quotation keeps the quotation's own full stop: “Sound.” rather than “Sound.”.
  if (phrase) return phrase(e, d).replace(/([.!?])”\.$/, '$1”');
  return `${who(e)}: ${e.action}${e.memoId ? ` on ${rev(e)}` : ''}.`;
}

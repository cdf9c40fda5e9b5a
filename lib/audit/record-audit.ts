import type { Transaction } from 'sequelize';
import { AuditEvent, db } from '@/models';

/** What the audit trail records. */
export const AUDIT_ACTIONS = [
  'sign-in',
  'sign-in-refused',
  'sign-in-throttled',
  'sign-out',
  'sessions.end',
  'memo.create',
  'memo.save',
  'memo.submit',
  'memo.approve',
  'memo.request-changes',
  'memo.freeze',
  'memo.reopen',
  'memo.co-authors',
  'revision.reverify',
  'pdf.download',
  'user.create',
  'user.update',
  'comment.create',
  'comment.update',
  'revision.release',
  'delivery.ack',
  'distribution.add',
  'distribution.remove',
  'delivery.sent',
  'delivery.failed',
  'delivery.resend',
  'delivery.open',
  'delivery.link-refused',
  'invitation.sent',
  'invitation.accept',
  'password-reset.request',
  'password-reset.throttled',
  'password-reset.complete',
  'organisation.update',
  'comment.reply',
  'comment.resolve',
  'comment.reopen',
  'signature.sign',
  'signature.refused',
  'signature.throttled',
  'orbit-message.download',
  'memo.restore',
  'memo.name-version',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export interface AuditEntry {
  actor: { id: number; email: string } | null;
  action: AuditAction;
  memoId?: number;
  revisionLetter?: string;
  details?: Record<string, unknown>;
}

/** Appends one event to the audit trail (in the caller's transaction when given). */
export async function recordAudit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await db();
  await AuditEvent.create(
    {
      at: new Date(),
      actorId: entry.actor?.id ?? null,
      actorEmail: entry.actor?.email ?? null,
      action: entry.action,
      memoId: entry.memoId ?? null,
      revisionLetter: entry.revisionLetter ?? null,
      details: entry.details ?? null,
    },
    { transaction },
  );
}

import type { Transaction } from 'sequelize';
import { Signature } from '@/models';
import type { SignedAction } from '@/models/signature';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { toSignatureRecord, type SignatureRecord } from './signature-record';

export interface SignatureToRecord {
  actor: Actor;
  memoId: number;
  action: SignedAction;
  meaning: string;
  memoVersion: number;
  reviewRound: number;
  revisionLetter?: string;
  signedAt?: Date;
}

/**
 * Stores one electronic signature and its audit event, in the transaction of
 * the transition it signs (so neither exists without the other). The printed
 * name and the role are copied as they are now.
 */
export async function recordSignature(s: SignatureToRecord, transaction: Transaction): Promise<SignatureRecord> {
  const row = await Signature.create(
    {
      memoId: s.memoId,
      userId: s.actor.id,
      printedName: s.actor.name,
      role: s.actor.role,
      action: s.action,
      meaning: s.meaning,
      memoVersion: s.memoVersion,
      reviewRound: s.reviewRound,
      revisionLetter: s.revisionLetter ?? null,
      signedAt: s.signedAt ?? new Date(),
    },
    { transaction },
  );
  const record = toSignatureRecord(row);
  await recordAudit(
    {
      actor: s.actor,
      action: 'signature.sign',
      memoId: s.memoId,
      revisionLetter: s.revisionLetter,
      details: {
        signedAction: s.action,
        meaning: s.meaning,
        printedName: record.printedName,
        role: record.role,
        signedAt: record.signedAt,
        version: s.memoVersion,
        round: s.reviewRound,
      },
    },
    transaction,
  );
  return record;
}

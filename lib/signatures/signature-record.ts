import type { Signature, SignedAction } from '@/models/signature';

/** A signature as stored in a frozen revision, shown in the PDF and returned by the API. */
export interface SignatureRecord {
  userId: number;
  printedName: string;
  role: string;
  action: SignedAction;
  meaning: string;
  /** ISO 8601, UTC. */
  signedAt: string;
  memoVersion: number;
  reviewRound: number;
  revisionLetter: string | null;
}

export const toSignatureRecord = (row: Signature): SignatureRecord => ({
  userId: row.userId,
  printedName: row.printedName,
  role: row.role,
  action: row.action,
  meaning: row.meaning,
  signedAt: new Date(row.signedAt).toISOString(),
  memoVersion: row.memoVersion,
  reviewRound: row.reviewRound,
  revisionLetter: row.revisionLetter,
});

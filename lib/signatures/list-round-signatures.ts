import type { Transaction } from 'sequelize';
import { Signature } from '@/models';
import { toSignatureRecord, type SignatureRecord } from './signature-record';

/**
 * The reviewers' signatures of one review round, oldest first: what a
 * revision frozen from that round records as its approval signatures.
 */
export async function listRoundSignatures(
  memoId: number,
  reviewRound: number,
  transaction?: Transaction,
): Promise<SignatureRecord[]> {
  const rows = await Signature.findAll({
    where: { memoId, reviewRound, action: ['approve', 'request-changes'] },
    order: [['id', 'ASC']],
    transaction,
  });
  return rows.map(toSignatureRecord);
}

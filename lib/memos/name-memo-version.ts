import { db, MemoVersion, MemoVersionLabel } from '@/models';
import { notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from './load-memo';
import { nameVersionInputSchema, type NameVersionInput } from './memo-schema';
import type { MemoVersionName } from './memo-record';

/**
 * Gives a saved version a name ("Checkpoint: before review"). The name is a
 * new row beside the version (memo_versions is never changed); naming a
 * version again adds a newer row, which is then its name. A named version
 * ends its editing session in the history (coalesce-memo-versions.ts).
 * Two people naming at once each add their row; the later one is the name.
 */
export async function nameMemoVersion(
  actor: Actor,
  memoId: number,
  versionNumber: number,
  input: NameVersionInput,
): Promise<MemoVersionName> {
  const { label } = nameVersionInputSchema.parse(input);
  const sequelize = await db();
  const row = await sequelize.transaction(async (transaction) => {
    await loadMemoFor(actor, memoId, 'memo.name-version', transaction);
    const exists = await MemoVersion.count({ where: { memoId, versionNumber }, transaction });
    if (exists === 0) throw notFound(`Version ${versionNumber} of memo ${memoId}`);
    const named = await MemoVersionLabel.create(
      { memoId, versionNumber, label, authorId: actor.id, createdAt: new Date() },
      { transaction },
    );
    await recordAudit(
      { actor, action: 'memo.name-version', memoId, details: { version: versionNumber, label } },
      transaction,
    );
    return named;
  });
  return {
    versionNumber,
    label: row.label,
    namedBy: { id: actor.id, name: actor.name },
    namedAt: new Date(row.createdAt).toISOString(),
  };
}

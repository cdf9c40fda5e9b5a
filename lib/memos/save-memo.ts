import { Transaction } from 'sequelize';
import { db, Memo, MemoVersion } from '@/models';
import { badRequest, conflict } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { patchMemoInputSchema, type PatchMemoInput, type TiptapDoc } from './memo-schema';
import { recordAudit } from '@/lib/audit/record-audit';
import { buildMemoDetail, peopleById } from './load-memo';
import { readMemoViewFor } from './get-memo';
import { checkMemoContent } from './check-memo-content';
import type { MemoDetail } from './memo-record';

/**
 * Saves a change to a memo with optimistic concurrency: the change names the
 * version it was based on; if someone saved since, nothing is written and a
 * 409 carries the current version (number, who, when) so the client can
 * offer to reload or to re-apply its change on top. An accepted save writes
 * the memo and a new MemoVersion in one transaction. Content is checked
 * against the document schema first (400 naming what and where); the same
 * path serves restoring a version (`restoredFrom`, audited as `memo.restore`)
 * and "keep mine" after a conflict.
 */
export async function saveMemo(actor: Actor, memoId: number, input: PatchMemoInput): Promise<MemoDetail> {
  const change = patchMemoInputSchema.parse(input);
  // Authorise, then check the document against the schema before taking the write lock (the check is CPU work).
  let checked: TiptapDoc | undefined;
  if (change.content !== undefined) {
    await readMemoViewFor(actor, memoId, 'memo.edit');
    checked = await checkMemoContent(memoId, change.content, 'save');
  }
  const sequelize = await db();
  // Every other writer waits while this transaction is open, so it holds
  // only what must happen under the lock: re-read and re-check the memo
  // (two plain queries, read-memo-view.ts), the conditional UPDATE, the
  // version row and the audit event. The reply is built from what was read
  // and written, with no read after the commit (another save could follow).
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo, facts, people, openThreads } = await readMemoViewFor(actor, memoId, 'memo.edit', transaction);
    if (memo.version !== change.baseVersion) {
      const latest = await MemoVersion.findOne({ where: { memoId, versionNumber: memo.version }, transaction });
      const by = latest ? (await peopleById([latest.authorId])).get(latest.authorId) : undefined;
      throw conflict(
        `This memo was saved as version ${memo.version}${by ? ` by ${by.name}` : ''} after version ${change.baseVersion}, which your change is based on. Nothing was overwritten.`,
        {
          currentVersion: memo.version,
          savedBy: by ?? null,
          savedAt: latest ? new Date(latest.createdAt).toISOString() : null,
        },
      );
    }
    if (change.restoredFrom !== undefined) {
      const restored = await MemoVersion.count({
        where: { memoId, versionNumber: change.restoredFrom },
        transaction,
      });
      if (restored === 0)
        throw badRequest(`restoredFrom names version ${change.restoredFrom}, which this memo does not have.`, {
          restoredFrom: `no saved version ${change.restoredFrom}`,
        });
    }
    const nextVersion = memo.version + 1;
    const title = change.title ?? memo.title;
    const content = checked ?? memo.content;
    // The time is set here (silent: Sequelize leaves updated_at to us) so the reply can carry it without reading it back.
    const updatedAt = new Date();
    const [updated] = await Memo.update(
      { title, content, version: nextVersion, updatedAt },
      { where: { id: memoId, version: change.baseVersion }, transaction, silent: true },
    );
    if (updated !== 1) {
      // Another instance's save committed between the read above and this UPDATE (PostgreSQL, READ COMMITTED:
      // the UPDATE waited for that row and re-checked its WHERE). Report the version that won.
      const current = await Memo.findByPk(memoId, { attributes: ['version'], transaction });
      throw conflict('This memo changed while saving; nothing was overwritten.', {
        currentVersion: current?.version ?? memo.version,
      });
    }
    // The version row and the audit event do not depend on each other: both are queued on the
    // transaction's connection at once, so the lock is held for one round trip less.
    await Promise.all([
      MemoVersion.create({ memoId, versionNumber: nextVersion, title, content, authorId: actor.id }, { transaction }),
      // A restore is its own kind of event: the history shows it as a session of its own (list-memo-versions.ts).
      recordAudit(
        change.restoredFrom === undefined
          ? { actor, action: 'memo.save', memoId, details: { version: nextVersion } }
          : {
              actor,
              action: 'memo.restore',
              memoId,
              details: { version: nextVersion, restoredFrom: change.restoredFrom },
            },
        transaction,
      ),
    ]);
    return buildMemoDetail(
      actor,
      { ...memo, title, content, version: nextVersion, updatedAt },
      facts,
      people,
      openThreads,
    );
  });
}

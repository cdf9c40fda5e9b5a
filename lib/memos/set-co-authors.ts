import { Op, Transaction } from 'sequelize';
import { db, MemoCoAuthor, User } from '@/models';
import { badRequest } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor, peopleById } from './load-memo';
import { setCoAuthorsInputSchema, type SetCoAuthorsInput } from './memo-schema';
import type { PersonRef } from './memo-record';

/**
 * The owner names the memo's co-authors (active analysts other than the
 * owner), replacing the list; the change and who made it go to the audit
 * trail. In one write transaction, so two owners' tabs cannot interleave.
 */
export async function setCoAuthors(
  actor: Actor,
  memoId: number,
  input: SetCoAuthorsInput,
): Promise<{ coAuthors: PersonRef[] }> {
  const { userIds } = setCoAuthorsInputSchema.parse(input);
  const wanted = [...new Set(userIds)];
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const { memo, facts } = await loadMemoFor(actor, memoId, 'memo.co-authors', transaction);
    if (wanted.includes(memo.ownerId))
      throw badRequest('The owner is already an author of the memo; list other analysts.', {
        userIds: `user ${memo.ownerId} owns the memo`,
      });
    const analysts = await User.findAll({
      where: { id: { [Op.in]: wanted }, role: 'analyst', active: true },
      attributes: ['id'],
      transaction,
    });
    const missing = wanted.filter((id) => !analysts.some((a) => a.id === id));
    if (missing.length > 0)
      throw badRequest(`Not an active analyst: ${missing.join(', ')}. Co-authors are analysts.`, {
        userIds: `not an active analyst: ${missing.join(', ')}`,
      });

    const added = wanted.filter((id) => !facts.coAuthorIds.includes(id));
    const removed = facts.coAuthorIds.filter((id) => !wanted.includes(id));
    if (removed.length > 0) await MemoCoAuthor.destroy({ where: { memoId, userId: removed }, transaction });
    for (const userId of added) await MemoCoAuthor.create({ memoId, userId, addedBy: actor.id }, { transaction });

    const people = await peopleById([...wanted, ...removed]);
    const names = (ids: number[]) => ids.map((id) => people.get(id)?.name ?? `user ${id}`);
    if (added.length > 0 || removed.length > 0) {
      await recordAudit(
        {
          actor,
          action: 'memo.co-authors',
          memoId,
          details: { added: names(added), removed: names(removed), coAuthors: names(wanted) },
        },
        transaction,
      );
    }
    const rows = await MemoCoAuthor.findAll({
      where: { memoId },
      attributes: ['userId'],
      order: [['id', 'ASC']],
      transaction,
    });
    return { coAuthors: rows.map((r) => people.get(r.userId) ?? { id: r.userId, name: `user ${r.userId}` }) };
  });
}

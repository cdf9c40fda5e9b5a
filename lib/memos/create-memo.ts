import { Transaction, UniqueConstraintError } from 'sequelize';
import { db, Memo, MemoVersion } from '@/models';
import { ApiError } from '@/lib/api/errors';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { createMemoInputSchema, EMPTY_DOC, type CreateMemoInput, type TiptapDoc } from './memo-schema';
import { peopleById, toMemoSummary } from './load-memo';
import { checkMemoContent } from './check-memo-content';
import { getTemplate } from '@/lib/templates';
import { recordAudit } from '@/lib/audit/record-audit';
import type { MemoSummary } from './memo-record';

/** Next free number of the form DM-YYYY-NNN (design memo, year, sequence). */
async function nextDocumentNumber(transaction: Transaction): Promise<string> {
  const year = new Date().getUTCFullYear();
  const prefix = `DM-${year}-`;
  const count = await Memo.count({ transaction });
  for (let n = count + 1; ; n++) {
    const candidate = `${prefix}${String(n).padStart(3, '0')}`;
    if (!(await Memo.findOne({ where: { documentNumber: candidate }, transaction, attributes: ['id'] })))
      return candidate;
  }
}

/**
 * Creates a memo owned by the actor, with version 1 written in the same
 * transaction: an empty document, or the named template's.
 */
export async function createMemo(actor: Actor, input: CreateMemoInput): Promise<MemoSummary> {
  assertGlobal(actor, 'memo.create');
  const parsed = createMemoInputSchema.parse(input);
  let content: TiptapDoc = EMPTY_DOC;
  if (parsed.templateId) {
    const template = getTemplate(parsed.templateId);
    if (!template)
      throw new ApiError('bad_request', `There is no template "${parsed.templateId}".`, {
        fields: { templateId: 'unknown template' },
      });
    // Templates are our own code, checked like any other content so that a broken one is refused, never stored.
    content = await checkMemoContent(null, template.build(), 'save');
  }
  const sequelize = await db();
  try {
    const memo = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
      const documentNumber = parsed.documentNumber ?? (await nextDocumentNumber(transaction));
      const created = await Memo.create(
        { documentNumber, title: parsed.title, content, ownerId: actor.id, version: 1, status: 'draft' },
        { transaction },
      );
      await MemoVersion.create(
        { memoId: created.id, versionNumber: 1, title: created.title, content, authorId: actor.id },
        { transaction },
      );
      await recordAudit(
        {
          actor,
          action: 'memo.create',
          memoId: created.id,
          details: { documentNumber, templateId: parsed.templateId ?? null },
        },
        transaction,
      );
      return created;
    });
    return toMemoSummary(memo, await peopleById([actor.id]));
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new ApiError('conflict', `Document number ${parsed.documentNumber} is already used by another memo.`, {
        fields: { documentNumber: 'already in use' },
      });
    }
    throw err;
  }
}

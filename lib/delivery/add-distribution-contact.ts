import crypto from 'node:crypto';
import { Transaction, UniqueConstraintError } from 'sequelize';
import { db, DistributionContact, User } from '@/models';
import { ApiError, badRequest, conflict } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { hashPassword } from '@/lib/users/password';
import type { AddContactInput } from './delivery-schema';
import { sendInvitation, type InvitationOutcome } from './send-invitation';
import { listDistribution } from './list-distribution';
import type { ContactRecord } from './delivery-record';

/**
 * Adds a customer contact to a memo's distribution list: an existing
 * customer account by id, or an e-mail address. An address with no account
 * becomes an invited customer account, inactive until the invitation is
 * accepted (its password is random and unknown to anyone until then), and
 * the invitation is mailed. A staff address is refused.
 */
export async function addDistributionContact(
  actor: Actor,
  memoId: number,
  input: AddContactInput,
): Promise<{ contact: ContactRecord; invitation: InvitationOutcome | null }> {
  const sequelize = await db();
  const { user, invite } = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    await loadMemoFor(actor, memoId, 'memo.distribute', transaction);
    let user: User | null;
    let invite = false;
    if ('userId' in input) {
      user = await User.findByPk(input.userId, { transaction });
      if (!user) throw badRequest(`There is no user ${input.userId}.`, { userId: 'no such user' });
    } else {
      user = await User.findOne({ where: { email: input.email }, transaction });
      if (!user) {
        const unusable = await hashPassword(crypto.randomBytes(32).toString('base64url'));
        user = await User.create(
          { email: input.email, name: input.name, role: 'customer', passwordHash: unusable, active: false },
          { transaction },
        );
        await recordAudit(
          {
            actor,
            action: 'user.create',
            details: { userId: user.id, email: user.email, role: 'customer', via: 'invitation' },
          },
          transaction,
        );
        invite = true;
      }
    }
    if (user.role !== 'customer')
      throw new ApiError(
        'conflict',
        `${user.email} belongs to a ${user.role} account; only customers go on a distribution list.`,
        { fields: { ['userId' in input ? 'userId' : 'email']: 'not a customer account' } },
      );
    try {
      await DistributionContact.create({ memoId, userId: user.id, addedBy: actor.id }, { transaction });
    } catch (err) {
      if (err instanceof UniqueConstraintError) throw conflict(`${user.name} is already on this distribution list.`);
      throw err;
    }
    await recordAudit(
      { actor, action: 'distribution.add', memoId, details: { userId: user.id, email: user.email, invited: invite } },
      transaction,
    );
    return { user, invite };
  });
  const invitation = invite ? await sendInvitation(user, actor, memoId) : null;
  const contact = (await listDistribution(actor, memoId)).find((c) => c.userId === user.id);
  if (!contact) throw new Error(`distribution contact not found after adding user ${user.id}`);
  return { contact, invitation };
}

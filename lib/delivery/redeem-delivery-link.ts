import { Transaction } from 'sequelize';
import { db, Delivery, Revision, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { checkToken, spendToken } from './link-token';
import { noteRevisionOpened } from './note-revision-opened';

export const ANOTHER_PERSON_SIGNED_IN =
  'Another person is signed in in this browser. Sign out first, then open the link again.';

/**
 * Spends a delivery link to sign its recipient in (the `delivery-link`
 * credentials provider). Null, with the refusal in the audit trail, for a
 * forged, expired, used or replaced link, or when the account is not active.
 * When the browser is signed in as someone else (`signedIn`), the link is
 * refused unspent with ANOTHER_PERSON_SIGNED_IN: a link must never silently
 * switch a browser to another person.
 */
export async function redeemDeliveryLink(token: string, signedIn: Actor | null = null): Promise<Actor | null> {
  const sequelize = await db();
  const outcome = await sequelize.transaction<Actor | null | { anotherPerson: number }>(
    { type: Transaction.TYPES.IMMEDIATE },
    async (transaction) => {
      const check = await checkToken(token, 'delivery', new Date(), transaction);
      const refuse = async (reason: string, userId: number | null) => {
        await recordAudit(
          { actor: null, action: 'delivery.link-refused', details: { reason, userId, via: 'sign-in' } },
          transaction,
        );
        return null;
      };
      if (!check.ok) return refuse(check.reason, check.claims?.userId ?? null);
      if (signedIn && signedIn.id !== check.claims.userId) return { anotherPerson: check.claims.userId };
      const user = await User.findByPk(check.claims.userId, { transaction });
      const delivery = await Delivery.findByPk(check.claims.deliveryId ?? 0, {
        attributes: ['id', 'revisionId', 'recipientId'],
        transaction,
      });
      if (!user || !delivery || delivery.recipientId !== user.id || delivery.revisionId !== check.claims.revisionId)
        return refuse('forged', check.claims.userId);
      if (!user.active || user.role !== 'customer') return refuse('inactive', user.id);
      if (!(await spendToken(check.row, transaction))) return refuse('used', user.id);
      const actor: Actor = { id: user.id, role: user.role, name: user.name, email: user.email };
      const revision = await Revision.findByPk(delivery.revisionId, {
        attributes: ['id', 'memoId', 'letter'],
        transaction,
      });
      if (revision) await noteRevisionOpened(actor, revision, 'link', transaction);
      await recordAudit(
        { actor, action: 'sign-in', details: { via: 'delivery link', deliveryId: delivery.id } },
        transaction,
      );
      return actor;
    },
  );
  if (outcome && 'anotherPerson' in outcome) {
    await recordAudit({
      actor: signedIn,
      action: 'delivery.link-refused',
      details: { reason: 'another person signed in', userId: outcome.anotherPerson, via: 'sign-in' },
    });
    throw new Error(ANOTHER_PERSON_SIGNED_IN);
  }
  return outcome;
}

import { Transaction } from 'sequelize';
import { db, Delivery, Revision, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { checkToken, spendToken } from './link-token';
import { noteRevisionOpened } from './note-revision-opened';

/**
 * Spends a delivery link to sign its recipient in (the `delivery-link`
 * credentials provider). Null, with the refusal in the audit trail, for a
 * forged, expired or used link, or when the account is not active.
 */
export async function redeemDeliveryLink(token: string): Promise<Actor | null> {
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const check = await checkToken(token, 'delivery', new Date(), transaction);
    const refuse = async (reason: string, userId: number | null) => {
      await recordAudit({ actor: null, action: 'delivery.link-refused', details: { reason, userId, via: 'sign-in' } }, transaction);
      return null;
    };
    if (!check.ok) return refuse(check.reason, check.claims?.userId ?? null);
    const user = await User.findByPk(check.claims.userId, { transaction });
    const delivery = await Delivery.findByPk(check.claims.deliveryId ?? 0, { attributes: ['id', 'revisionId', 'recipientId'], transaction });
    if (!user || !delivery || delivery.recipientId !== user.id || delivery.revisionId !== check.claims.revisionId) return refuse('forged', check.claims.userId);
    if (!user.active || user.role !== 'customer') return refuse('inactive', user.id);
    if (!(await spendToken(check.row, transaction))) return refuse('used', user.id);
    const actor: Actor = { id: user.id, role: user.role, name: user.name, email: user.email };
    const revision = await Revision.findByPk(delivery.revisionId, { attributes: ['id', 'memoId', 'letter'], transaction });
    if (revision) await noteRevisionOpened(actor, revision, 'link', transaction);
    await recordAudit({ actor, action: 'sign-in', details: { via: 'delivery link', deliveryId: delivery.id } }, transaction);
    return actor;
  });
}

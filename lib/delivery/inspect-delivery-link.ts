import { db, Delivery, Revision, User } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { checkToken } from './link-token';

export type LinkRefusal = 'forged' | 'expired' | 'used' | 'replaced' | 'inactive';

export type LinkView =
  | {
      ok: true;
      memoId: number;
      letter: string;
      documentNumber: string;
      title: string;
      recipientId: number;
      recipientName: string;
      expiresAt: string;
    }
  | { ok: false; reason: LinkRefusal; expiredAt?: string };

/** What a delivery link points at, without spending it; refusals are recorded in the audit trail. */
export async function inspectDeliveryLink(token: string): Promise<LinkView> {
  await db();
  const check = await checkToken(token, 'delivery');
  if (!check.ok) {
    await recordAudit({
      actor: null,
      action: 'delivery.link-refused',
      details: {
        reason: check.reason,
        userId: check.claims?.userId ?? null,
        deliveryId: check.claims?.deliveryId ?? null,
      },
    });
    return {
      ok: false,
      reason: check.reason,
      expiredAt: check.reason === 'expired' ? check.claims?.expiresAt.toISOString() : undefined,
    };
  }
  const delivery = await Delivery.findByPk(check.claims.deliveryId ?? 0, {
    attributes: ['id', 'revisionId', 'recipientId'],
  });
  const revision =
    delivery &&
    (await Revision.findByPk(delivery.revisionId, { attributes: ['memoId', 'letter', 'documentNumber', 'title'] }));
  const user = await User.findByPk(check.claims.userId, { attributes: ['name', 'active'] });
  if (
    !delivery ||
    !revision ||
    !user ||
    delivery.recipientId !== check.claims.userId ||
    delivery.revisionId !== check.claims.revisionId
  )
    return { ok: false, reason: 'forged' };
  if (!user.active) return { ok: false, reason: 'inactive' };
  return {
    ok: true,
    memoId: revision.memoId,
    letter: revision.letter,
    documentNumber: revision.documentNumber,
    title: revision.title,
    recipientId: check.claims.userId,
    recipientName: user.name,
    expiresAt: check.claims.expiresAt.toISOString(),
  };
}

import { Op } from 'sequelize';
import { AccessToken, DistributionContact, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import type { ContactRecord } from './delivery-record';

/** The memo's distribution list, in the order contacts were added. */
export async function listDistribution(actor: Actor, memoId: number): Promise<ContactRecord[]> {
  await loadMemoFor(actor, memoId, 'memo.tracking');
  const contacts = await DistributionContact.findAll({ where: { memoId }, order: [['id', 'ASC']] });
  const ids = contacts.map((c) => c.userId);
  const users = new Map((await User.findAll({ where: { id: ids } })).map((u) => [u.id, u]));
  const invited = new Set(
    (
      await AccessToken.findAll({
        where: { userId: ids, purpose: 'invitation', usedAt: null, expiresAt: { [Op.gt]: new Date() } },
        attributes: ['userId'],
      })
    ).map((t) => t.userId),
  );
  return contacts.flatMap((c) => {
    const u = users.get(c.userId);
    if (!u) return [];
    const state: ContactRecord['state'] = u.active ? 'active' : invited.has(u.id) ? 'invited' : 'inactive';
    return [{ userId: u.id, name: u.name, email: u.email, state, addedAt: new Date(c.createdAt).toISOString() }];
  });
}

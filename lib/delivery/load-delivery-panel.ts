import { decideMemo, decideGlobal, type Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import { listUsers } from '@/lib/users/list-users';
import type { RevisionSummary } from '@/lib/revisions/revision-record';
import { listDistribution } from './list-distribution';
import { listMemoDeliveries } from './list-memo-deliveries';
import type { ContactRecord, RevisionDeliveries } from './delivery-record';

export interface DeliveryPanelData {
  letters: string[];
  contacts: ContactRecord[];
  customers: { id: number; name: string }[];
  tracking: RevisionDeliveries[];
  canDistribute: boolean;
  canRelease: boolean;
}

/** What the memo page's delivery panel shows this staff member; null when it has nothing for them (no revision, nothing to manage). */
export async function loadDeliveryPanel(
  actor: Actor,
  memoId: number,
  revisions: RevisionSummary[],
): Promise<DeliveryPanelData | null> {
  const { facts } = await loadMemoFor(actor, memoId, 'memo.view');
  if (!decideMemo(actor, 'memo.tracking', facts).allowed) return null;
  const canDistribute = decideMemo(actor, 'memo.distribute', facts).allowed;
  const tracking = await listMemoDeliveries(actor, memoId);
  if (!canDistribute && tracking.length === 0) return null;
  const contacts = await listDistribution(actor, memoId);
  const customers =
    canDistribute && decideGlobal(actor, 'user.directory').allowed
      ? (await listUsers(actor, { role: 'customer' }))
          .filter((u) => !('active' in u) || u.active)
          .map((u) => ({ id: u.id, name: u.name }))
      : [];
  return {
    letters: revisions.map((r) => r.letter),
    contacts,
    customers,
    tracking,
    canDistribute,
    canRelease: decideMemo(actor, 'memo.release', facts).allowed,
  };
}

import { Delivery, Release, Revision, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor } from '@/lib/memos/load-memo';
import type { DeliveryRecord, ReleaseRecord, RevisionDeliveries } from './delivery-record';

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

export function toDeliveryRecord(d: Delivery, people: Map<number, User>): DeliveryRecord {
  const u = people.get(d.recipientId);
  return {
    id: d.id,
    releaseId: d.releaseId,
    recipient: { id: d.recipientId, name: u?.name ?? `user ${d.recipientId}`, email: d.recipientEmail },
    status: d.status,
    attempts: d.attempts,
    sentAt: iso(d.lastAttemptAt),
    deliveredAt: iso(d.deliveredAt),
    error: d.status === 'delivered' ? null : d.lastError,
    nextAttemptAt: d.status === 'failed' ? iso(d.nextAttemptAt) : null,
    pdfAttached: d.pdfAttached,
    firstOpenedAt: iso(d.firstOpenedAt),
    acknowledgedAt: iso(d.acknowledgedAt),
  };
}

async function toReleaseRecords(releases: Release[]): Promise<ReleaseRecord[]> {
  if (releases.length === 0) return [];
  const deliveries = await Delivery.findAll({
    where: { releaseId: releases.map((r) => r.id) },
    order: [['id', 'ASC']],
  });
  const revisions = await Revision.findAll({
    where: { id: [...new Set(releases.map((r) => r.revisionId))] },
    attributes: ['id', 'letter'],
  });
  const people = await User.findAll({
    where: { id: [...new Set([...deliveries.map((d) => d.recipientId), ...releases.map((r) => r.releasedBy)])] },
    attributes: ['id', 'name'],
  });
  const byId = new Map(people.map((p) => [p.id, p]));
  const letters = new Map(revisions.map((r) => [r.id, r.letter]));
  return releases.map((r) => ({
    id: r.id,
    memoId: r.memoId,
    letter: letters.get(r.revisionId) ?? '?',
    coverNote: r.coverNote,
    releasedAt: new Date(r.releasedAt).toISOString(),
    releasedBy: { id: r.releasedBy, name: byId.get(r.releasedBy)?.name ?? `user ${r.releasedBy}` },
    deliveries: deliveries.filter((d) => d.releaseId === r.id).map((d) => toDeliveryRecord(d, byId)),
  }));
}

/** One release with its deliveries as they stand now. */
export async function getRelease(releaseId: number): Promise<ReleaseRecord> {
  const release = await Release.findByPk(releaseId, { rejectOnEmpty: true });
  return (await toReleaseRecords([release]))[0];
}

/** Tracking for staff: per revision (newest first), each release and each recipient's delivery. */
export async function listMemoDeliveries(actor: Actor, memoId: number): Promise<RevisionDeliveries[]> {
  await loadMemoFor(actor, memoId, 'memo.tracking');
  const releases = await Release.findAll({ where: { memoId }, order: [['id', 'DESC']] });
  const records = await toReleaseRecords(releases);
  const byLetter = new Map<string, ReleaseRecord[]>();
  for (const r of records) byLetter.set(r.letter, [...(byLetter.get(r.letter) ?? []), r]);
  return [...byLetter]
    .map(([letter, list]) => ({ letter, releases: list }))
    .sort((a, b) => a.letter.length - b.letter.length || b.letter.localeCompare(a.letter));
}

import { db, Delivery, Release, Revision, User } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import type { PortalEntry } from './delivery-record';

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

/** Every revision released to this customer, newest release first (one entry per revision). */
export async function listPortalRevisions(actor: Actor): Promise<PortalEntry[]> {
  assertGlobal(actor, 'portal.view');
  await db();
  const deliveries = await Delivery.findAll({ where: { recipientId: actor.id }, order: [['id', 'DESC']] });
  if (deliveries.length === 0) return [];
  const releases = new Map(
    (await Release.findAll({ where: { id: [...new Set(deliveries.map((d) => d.releaseId))] } })).map((r) => [r.id, r]),
  );
  const revisions = new Map(
    (
      await Revision.findAll({
        where: { id: [...new Set(deliveries.map((d) => d.revisionId))] },
        attributes: [
          'id',
          'memoId',
          'letter',
          'documentNumber',
          'title',
          'frozenAt',
          'changeSummary',
          'pdfSha256',
          'pdfData',
          'opmSha256',
          'oemSha256',
        ],
      })
    ).map((r) => [r.id, r]),
  );
  const names = new Map(
    (
      await User.findAll({
        where: { id: [...new Set([...releases.values()].map((r) => r.releasedBy))] },
        attributes: ['id', 'name'],
      })
    ).map((u) => [u.id, u.name]),
  );
  const seen = new Map<number, PortalEntry>();
  for (const d of deliveries) {
    const rev = revisions.get(d.revisionId);
    const rel = releases.get(d.releaseId);
    if (!rev || !rel) continue;
    const entry = seen.get(rev.id);
    if (entry) {
      // An earlier release of the same revision: keep the newest, but opening and acknowledgement count from any.
      entry.firstOpenedAt =
        [entry.firstOpenedAt, iso(d.firstOpenedAt)].filter((x): x is string => x !== null).sort()[0] ?? null;
      entry.acknowledgedAt ??= iso(d.acknowledgedAt);
      continue;
    }
    seen.set(rev.id, {
      memoId: rev.memoId,
      documentNumber: rev.documentNumber,
      title: rev.title,
      letter: rev.letter,
      frozenAt: new Date(rev.frozenAt).toISOString(),
      changeSummary: rev.changeSummary,
      releasedAt: new Date(rel.releasedAt).toISOString(),
      coverNote: rel.coverNote,
      releasedBy: names.get(rel.releasedBy) ?? 'Configuration manager',
      pdfSha256: rev.pdfSha256,
      pdfBytes: rev.pdfData.length,
      opmSha256: rev.opmSha256 ?? null,
      oemSha256: rev.oemSha256 ?? null,
      firstOpenedAt: iso(d.firstOpenedAt),
      acknowledgedAt: iso(d.acknowledgedAt),
    });
  }
  return [...seen.values()].sort((a, b) => b.releasedAt.localeCompare(a.releasedAt));
}

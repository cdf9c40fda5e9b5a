import { Op } from 'sequelize';
import { Delivery, Release, Revision, User } from '@/models';
import { forbidden } from '@/lib/api/errors';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { getRevision } from '@/lib/revisions/list-revisions';
import { revisionRecordRow, toApprovalSignature } from '@/lib/revisions/approval-for-pdf';
import { listPortalRevisions } from './list-portal-revisions';
import { noteRevisionOpened } from './note-revision-opened';
import type { PortalRevision } from './delivery-record';

/**
 * One released revision as its customer sees it: the frozen record (summary,
 * approvals, revision record, PDF digest) and the releases to them. Nothing
 * of the memo's drafts or review threads. Opening it counts as opening.
 */
export async function getPortalRevision(actor: Actor, memoId: number, letter: string): Promise<PortalRevision> {
  assertGlobal(actor, 'portal.view');
  const rev = await getRevision(actor, memoId, letter);
  const entry = (await listPortalRevisions(actor)).find((e) => e.memoId === memoId && e.letter === rev.letter);
  if (!entry) throw forbidden('This revision has not been released to you.');
  await noteRevisionOpened(actor, rev, 'portal');
  const earlier = await Revision.findAll({
    where: { memoId, id: { [Op.lte]: rev.id } },
    attributes: ['letter', 'frozenAt', 'changeSummary', 'frozenBy', 'approval'],
    order: [['id', 'ASC']],
  });
  const deliveries = await Delivery.findAll({
    where: { revisionId: rev.id, recipientId: actor.id },
    attributes: ['releaseId', 'firstOpenedAt'],
  });
  const releases = await Release.findAll({
    where: { id: deliveries.map((d) => d.releaseId) },
    order: [['releasedAt', 'DESC']],
  });
  const names = new Map(
    (
      await User.findAll({
        where: { id: [...new Set([...earlier.map((e) => e.frozenBy), ...releases.map((r) => r.releasedBy)])] },
        attributes: ['id', 'name'],
      })
    ).map((u) => [u.id, u.name]),
  );
  const opened =
    deliveries
      .map((d) => d.firstOpenedAt)
      .filter((d): d is Date => d !== null)
      .map((d) => new Date(d).toISOString())
      .sort()[0] ?? null;
  return {
    ...entry,
    firstOpenedAt: opened,
    approval: {
      author: rev.approval.author.name,
      reviewers: rev.approval.reviewers.map((r) => ({ name: r.name, decision: r.decision, decidedAt: r.decidedAt })),
      configurationManager: rev.approval.configurationManager.name,
      frozenAt: rev.approval.configurationManager.frozenAt,
      signatures: (rev.approval.signatures ?? []).map(toApprovalSignature),
    },
    revisionRecord: earlier.map((e) => {
      const row = revisionRecordRow(e.letter, e.frozenAt, e.changeSummary, e.approval, names.get(e.frozenBy));
      return {
        letter: e.letter,
        date: row.date,
        summary: e.changeSummary,
        by: names.get(e.frozenBy) ?? '',
        author: row.author ?? '',
        reviewers: row.reviewers ?? '',
        releasedBy: row.releasedBy ?? '',
      };
    }),
    releases: releases.map((r) => ({
      releasedAt: new Date(r.releasedAt).toISOString(),
      coverNote: r.coverNote,
      releasedBy: names.get(r.releasedBy) ?? '',
    })),
  };
}

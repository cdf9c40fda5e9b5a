import { Op } from 'sequelize';
import { AuditEvent, MemoVersion, MemoVersionLabel } from '@/models';
import { notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor, peopleById } from './load-memo';
import type { MemoVersionDetail, MemoVersionSummary } from './memo-record';
import { coalesceMemoVersions, type EditingSession } from './coalesce-memo-versions';

/** Audit events that end an editing session at the version they name (see coalesce-memo-versions.ts). */
const SESSION_ENDING_ACTIONS = [
  'memo.restore',
  'memo.submit',
  'memo.approve',
  'memo.request-changes',
  'memo.reopen',
  'memo.freeze',
] as const;

const versionIn = (details: Record<string, unknown> | null, key: string): number | null =>
  typeof details?.[key] === 'number' ? (details[key] as number) : null;

/**
 * A memo's history, newest first: its editing sessions (saves by one person
 * without a long pause, a name or a workflow step between them), each shown
 * as its last version; or, with `everySave`, each stored version as an entry
 * of its own (for comparing or restoring any save).
 */
export async function listMemoVersions(
  actor: Actor,
  memoId: number,
  { everySave = false }: { everySave?: boolean } = {},
): Promise<MemoVersionSummary[]> {
  await loadMemoFor(actor, memoId, 'memo.versions');
  const [versions, labelRows, events] = await Promise.all([
    MemoVersion.findAll({
      where: { memoId },
      order: [['versionNumber', 'DESC']],
      attributes: { exclude: ['content'] },
    }),
    MemoVersionLabel.findAll({ where: { memoId }, order: [['id', 'ASC']] }),
    AuditEvent.findAll({
      where: { memoId, action: { [Op.in]: [...SESSION_ENDING_ACTIONS] } },
      attributes: ['action', 'details'],
    }),
  ]);
  // Rows in insertion order: a later name of a version replaces the earlier one.
  const labels = new Map(labelRows.map((l) => [l.versionNumber, l.label]));
  const transitionsAt = new Set<number>();
  const restoredFrom = new Map<number, number>();
  for (const e of events) {
    const at = versionIn(e.details, e.action === 'memo.freeze' ? 'memoVersion' : 'version');
    if (at === null) continue;
    if (e.action !== 'memo.restore') transitionsAt.add(at);
    else {
      const from = versionIn(e.details, 'restoredFrom');
      if (from !== null) restoredFrom.set(at, from);
    }
  }
  const saves = versions.map((v) => ({
    versionNumber: v.versionNumber,
    authorId: v.authorId,
    createdAt: new Date(v.createdAt),
    restoredFrom: restoredFrom.get(v.versionNumber) ?? null,
  }));
  const titles = new Map(versions.map((v) => [v.versionNumber, v.title]));
  const entries: EditingSession[] = everySave
    ? saves.map((s) => ({
        ...s,
        firstVersionNumber: s.versionNumber,
        saveCount: 1,
        startedAt: s.createdAt,
        label: labels.get(s.versionNumber) ?? null,
      }))
    : coalesceMemoVersions(saves, { labels, transitionsAt });
  const people = await peopleById(entries.map((e) => e.authorId));
  return entries.map((e) => ({
    versionNumber: e.versionNumber,
    firstVersionNumber: e.firstVersionNumber,
    saveCount: e.saveCount,
    title: titles.get(e.versionNumber) ?? '',
    author: people.get(e.authorId) ?? { id: e.authorId, name: `user ${e.authorId}` },
    startedAt: e.startedAt.toISOString(),
    createdAt: e.createdAt.toISOString(),
    label: e.label,
    restoredFrom: e.restoredFrom,
  }));
}

/** One saved version with its content, read-only. */
export async function getMemoVersion(actor: Actor, memoId: number, versionNumber: number): Promise<MemoVersionDetail> {
  await loadMemoFor(actor, memoId, 'memo.versions');
  const v = await MemoVersion.findOne({ where: { memoId, versionNumber } });
  if (!v) throw notFound(`Version ${versionNumber} of memo ${memoId}`);
  const [people, label] = await Promise.all([
    peopleById([v.authorId]),
    MemoVersionLabel.findOne({ where: { memoId, versionNumber }, order: [['id', 'DESC']] }),
  ]);
  return {
    memoId,
    versionNumber: v.versionNumber,
    title: v.title,
    content: v.content,
    author: people.get(v.authorId) ?? { id: v.authorId, name: `user ${v.authorId}` },
    createdAt: new Date(v.createdAt).toISOString(),
    label: label?.label ?? null,
  };
}

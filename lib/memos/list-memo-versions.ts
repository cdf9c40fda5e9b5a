import { MemoVersion } from '@/models';
import { notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { loadMemoFor, peopleById } from './load-memo';
import type { MemoVersionDetail, MemoVersionSummary } from './memo-record';

/** Every saved version of a memo, newest first. */
export async function listMemoVersions(actor: Actor, memoId: number): Promise<MemoVersionSummary[]> {
  await loadMemoFor(actor, memoId, 'memo.versions');
  const versions = await MemoVersion.findAll({
    where: { memoId },
    order: [['versionNumber', 'DESC']],
    attributes: { exclude: ['content'] },
  });
  const people = await peopleById(versions.map((v) => v.authorId));
  return versions.map((v) => ({
    versionNumber: v.versionNumber,
    title: v.title,
    author: people.get(v.authorId) ?? { id: v.authorId, name: `user ${v.authorId}` },
    createdAt: new Date(v.createdAt).toISOString(),
  }));
}

/** One saved version with its content, read-only. */
export async function getMemoVersion(actor: Actor, memoId: number, versionNumber: number): Promise<MemoVersionDetail> {
  await loadMemoFor(actor, memoId, 'memo.versions');
  const v = await MemoVersion.findOne({ where: { memoId, versionNumber } });
  if (!v) throw notFound(`Version ${versionNumber} of memo ${memoId}`);
  const people = await peopleById([v.authorId]);
  return {
    memoId,
    versionNumber: v.versionNumber,
    title: v.title,
    content: v.content,
    author: people.get(v.authorId) ?? { id: v.authorId, name: `user ${v.authorId}` },
    createdAt: new Date(v.createdAt).toISOString(),
  };
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { getMemo } from '@/lib/memos/get-memo';
import { getMemoVersion, listMemoVersions } from '@/lib/memos/list-memo-versions';
import { parseId } from '@/lib/api/route-handler';
import { MemoReadView } from '@/components/memos/MemoReadView';
import { StatusBadge } from '@/components/memos/StatusBadge';
import { Problem, problemFor } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';
import type { MemoDetail, MemoVersionDetail, MemoVersionSummary } from '@/lib/memos/memo-record';

export const metadata: Metadata = { title: 'Memo' };
export const dynamic = 'force-dynamic';

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function MemoPage({ params, searchParams }: Props) {
  const { id } = await params;
  const query = await searchParams;
  const actor = await requirePageActor(`/memos/${id}`);
  let memo: MemoDetail;
  let versions: MemoVersionSummary[] = [];
  let shownVersion: MemoVersionDetail | null = null;
  try {
    const memoId = parseId(id, 'memo id');
    memo = await getMemo(actor, memoId);
    if (memo.allowedActions.includes('memo.versions')) versions = await listMemoVersions(actor, memoId);
    if (typeof query.version === 'string') shownVersion = await getMemoVersion(actor, memoId, parseId(query.version, 'version'));
  } catch (err) {
    const p = problemFor(err);
    if (p) return <Problem {...p} />;
    throw err;
  }
  const canEdit = memo.allowedActions.includes('memo.edit');
  const content = shownVersion ? shownVersion.content : memo.content;

  return (
    <div className="grid gap-8 lg:grid-cols-[1fr_16rem]">
      <article>
        <header className="mb-6 border-b border-rule pb-4">
          <p className="font-mono text-note text-ink-soft">{memo.documentNumber}</p>
          <h1 className="mt-1 text-display font-semibold">{shownVersion ? shownVersion.title : memo.title}</h1>
          <div className="mt-3 flex flex-wrap items-center gap-3 text-note text-ink-soft">
            <StatusBadge status={memo.status} />
            <span>Version {shownVersion ? shownVersion.versionNumber : memo.version}</span>
            <span>Owner {memo.owner.name}</span>
            <span>Updated {formatDateTime(memo.updatedAt)}</span>
            {memo.reviewers.length > 0 && <span>Reviewers {memo.reviewers.map((r) => r.name).join(', ')}</span>}
          </div>
          {shownVersion && (
            <p className="mt-3 rounded-chip border border-sunline-500 bg-sunline-50 px-3 py-2 text-note text-sunline-700" role="status">
              You are reading version {shownVersion.versionNumber}, saved by {shownVersion.author.name} on {formatDateTime(shownVersion.createdAt)}.{' '}
              <Link href={`/memos/${memo.id}`}>Back to the current version</Link>
            </p>
          )}
          {!shownVersion && !canEdit && actor.role === 'analyst' && (
            <p className="mt-3 text-note text-ink-soft">This memo is {memo.status.replace('-', ' ')} and cannot be edited.</p>
          )}
        </header>
        <div className="sheet px-8 py-6">
          <MemoReadView content={content} />
        </div>
      </article>
      {versions.length > 0 && (
        <aside aria-label="Version history" className="text-note">
          <h2 className="label">Saved versions</h2>
          <ol className="space-y-1">
            {versions.map((v) => {
              const current = shownVersion ? v.versionNumber === shownVersion.versionNumber : v.versionNumber === memo.version;
              return (
                <li key={v.versionNumber}>
                  <Link href={`/memos/${memo.id}?version=${v.versionNumber}`} aria-current={current ? 'true' : undefined} className={`block rounded-chip px-2 py-1 no-underline hover:bg-paper-sunk ${current ? 'bg-orbit-50 text-orbit-700' : 'text-ink'}`}>
                    <span className="font-medium">v{v.versionNumber}</span> · {v.author.name}
                    <span className="block text-micro text-ink-faint">{formatDateTime(v.createdAt)}</span>
                  </Link>
                </li>
              );
            })}
          </ol>
        </aside>
      )}
    </div>
  );
}

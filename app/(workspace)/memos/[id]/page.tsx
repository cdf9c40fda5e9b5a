import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { requirePageActor } from '@/lib/auth/current-actor';
import { parseId } from '@/lib/api/route-handler';
import { FIGURE_KINDS } from '@/lib/figures/figure-kinds';
import { MemoEditor } from '@/components/editor/MemoEditor';
import { StatusBadge } from '@/components/memos/StatusBadge';
import { CoAuthorsPanel } from '@/components/memos/CoAuthorsPanel';
import { Problem, problemFor } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';
import { MemoSavedStamp } from '@/components/memos/MemoSavedStamp';
import type { MemoDetail } from '@/lib/memos/memo-record';
import { loadMemoPage, type MemoPageLoad } from '@/lib/memos/load-memo-page';
import { revisionLetter } from '@/lib/revisions/revision-letter';
import { WorkflowPanel } from '@/components/workflow/WorkflowPanel';
import { RevisionsPanel } from '@/components/revisions/RevisionsPanel';
import { DeliveryPanel } from '@/components/delivery/DeliveryPanel';

export const metadata: Metadata = { title: 'Memo' };
export const dynamic = 'force-dynamic';

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function MemoPage({ params, searchParams }: Props) {
  const { id } = await params;
  const query = await searchParams;
  const actor = await requirePageActor(`/memos/${id}`);
  let load: MemoPageLoad;
  try {
    load = await loadMemoPage(
      actor,
      parseId(id, 'memo id'),
      typeof query.version === 'string' ? parseId(query.version, 'version') : undefined,
    );
  } catch (err) {
    const p = problemFor(err);
    if (p) return <Problem {...p} />;
    throw err;
  }
  if (load.kind === 'portal') redirect(load.path);
  if (load.kind === 'not-shared')
    return <Problem title="Not available to you" message="This memo is not shared with you." />;
  const { memo, shownVersion, content, editable, canCompute, revisions, decisions, delivery } = load;
  const shown: MemoDetail = shownVersion ? { ...memo, title: shownVersion.title, content } : memo;

  return (
    <div>
      <header className="mb-4 border-b border-rule pb-3">
        <p className="font-mono text-note text-ink-soft">{memo.documentNumber}</p>
        <div className="mt-2 flex flex-wrap items-center gap-3 text-note text-ink-soft">
          <StatusBadge status={memo.status} />
          {shownVersion ? (
            <span>Version {shownVersion.versionNumber}</span>
          ) : (
            <MemoSavedStamp part="version" memoId={memo.id} version={memo.version} updatedAt={memo.updatedAt} />
          )}
          <span>Owner {memo.owner.name}</span>
          {memo.coAuthors.length > 0 && <span>Co-authors {memo.coAuthors.map((c) => c.name).join(', ')}</span>}
          <MemoSavedStamp part="updated" memoId={memo.id} version={memo.version} updatedAt={memo.updatedAt} />
          {memo.reviewers.length > 0 && <span>Reviewers {memo.reviewers.map((r) => r.name).join(', ')}</span>}
          {!editable && !shownVersion && (
            <span className="rounded-chip border border-rule px-1.5 py-0.5 text-micro uppercase">read-only</span>
          )}
        </div>
        <div className="mt-3 flex flex-wrap gap-3 text-note">
          {memo.allowedActions.includes('memo.versions') && (
            <>
              <a href={`/api/memos/${memo.id}/pdf`} target="_blank" rel="noreferrer" className="btn-quiet no-underline">
                Preview PDF
              </a>
              <a href={`/api/memos/${memo.id}/pdf`} download className="btn-quiet no-underline">
                Download PDF
              </a>
            </>
          )}
          {memo.allowedActions.includes('memo.versions') && (
            <Link href={`/memos/${memo.id}/compare`} className="btn-quiet no-underline">
              Compare versions
            </Link>
          )}
          {!shownVersion && memo.allowedActions.includes('memo.co-authors') && (
            <CoAuthorsPanel memoId={memo.id} owner={memo.owner} coAuthors={memo.coAuthors} />
          )}
        </div>
        {!editable && !shownVersion && memo.editRefusal && (
          <p className="mt-2 text-note text-ink-soft" role="status" data-read-only-reason>
            {memo.editRefusal}
          </p>
        )}
        {shownVersion && (
          <p
            className="mt-3 rounded-chip border border-sunline-500 bg-sunline-50 px-3 py-2 text-note text-sunline-700"
            role="status"
          >
            You are reading version {shownVersion.versionNumber}, saved by {shownVersion.author.name} on{' '}
            {formatDateTime(shownVersion.createdAt)}, read-only.{' '}
            <Link href={`/memos/${memo.id}`}>Back to the current version</Link>
          </p>
        )}
      </header>
      {!shownVersion && (
        <WorkflowPanel
          memoId={memo.id}
          status={memo.status}
          allowedActions={memo.allowedActions}
          reviewerIds={memo.reviewers.map((r) => r.id)}
          decisions={decisions}
          nextLetter={revisionLetter(revisions.length)}
          signerName={actor.name}
        />
      )}
      {!shownVersion && delivery && <DeliveryPanel memoId={memo.id} {...delivery} />}
      <MemoEditor
        aside={<RevisionsPanel memoId={memo.id} revisions={revisions} canReverify={canCompute} />}
        // A new editor when editability changes (submitted, sent back, reopened): Tiptap reads
        // `editable` when it is created, and node views read it when they render.
        key={shownVersion ? `v${shownVersion.versionNumber}` : editable ? 'current-editable' : 'current-read-only'}
        memo={shown}
        kinds={load.kinds}
        figureKinds={FIGURE_KINDS}
        initialResults={load.initialResults}
        editable={editable}
        canCompute={canCompute}
      />
    </div>
  );
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { listPortalRevisions } from '@/lib/delivery/list-portal-revisions';
import { Problem } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Released to you' };
export const dynamic = 'force-dynamic';

/** The customer's portal: every revision released to them, newest first. */
export default async function PortalPage() {
  const actor = await requirePageActor('/portal');
  const d = decideGlobal(actor, 'portal.view');
  if (!d.allowed) return <Problem title="Not available to you" message={d.reason} />;
  const entries = await listPortalRevisions(actor);
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-title font-semibold">Released to you</h1>
        <p className="text-note text-ink-soft">
          Frozen revisions of design memos released to {actor.name}, newest first. Each PDF is the stored original; its
          SHA-256 is shown beside it.
        </p>
      </div>
      {entries.length === 0 ? (
        <div className="sheet px-6 py-12 text-center text-body text-ink-soft">
          No revision has been released to you yet.
        </div>
      ) : (
        <ol className="space-y-3" aria-label="Released revisions">
          {entries.map((e) => (
            <li key={`${e.memoId}-${e.letter}`} className="sheet p-4">
              <div className="flex flex-wrap items-baseline gap-3">
                <span className="font-mono text-note text-ink-soft">{e.documentNumber}</span>
                <span className="rounded-chip bg-orbit-50 px-1.5 py-0.5 text-micro font-semibold uppercase text-orbit-700">
                  Revision {e.letter}
                </span>
                {e.acknowledgedAt ? (
                  <span className="text-micro text-moss-700">✓ acknowledged {formatDateTime(e.acknowledgedAt)}</span>
                ) : (
                  <span className="text-micro text-sunline-700">awaiting your acknowledgement</span>
                )}
              </div>
              <h2 className="mt-1 text-lead font-semibold">
                <Link href={`/portal/${e.memoId}/${e.letter}`}>{e.title}</Link>
              </h2>
              <p className="text-note text-ink-soft">
                Released {formatDateTime(e.releasedAt)} by {e.releasedBy} · frozen {formatDateTime(e.frozenAt)}
              </p>
              <p className="mt-2 text-body">{e.changeSummary}</p>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}

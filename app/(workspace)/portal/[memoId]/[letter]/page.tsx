import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { parseId } from '@/lib/api/route-handler';
import { getPortalRevision } from '@/lib/delivery/get-portal-revision';
import type { PortalRevision } from '@/lib/delivery/delivery-record';
import { Problem, problemFor } from '@/components/shell/Problem';
import { AcknowledgeButton } from '@/components/delivery/AcknowledgeButton';
import { pdfFileName } from '@/lib/pdf/pdf-file-name';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Released revision' };
export const dynamic = 'force-dynamic';

type Props = { params: Promise<{ memoId: string; letter: string }> };

/** One revision released to the customer: the stored PDF, its record, the cover note, and the acknowledgement. */
export default async function PortalRevisionPage({ params }: Props) {
  const { memoId, letter } = await params;
  const actor = await requirePageActor(`/portal/${memoId}/${letter}`);
  let rev: PortalRevision;
  try {
    rev = await getPortalRevision(actor, parseId(memoId, 'memo id'), letter);
  } catch (err) {
    const p = problemFor(err);
    if (p) return <Problem {...p} />;
    throw err;
  }
  const kib = Math.ceil(rev.pdfBytes / 1024);
  return (
    <div className="space-y-4">
      <p className="text-note">
        <Link href="/portal">← Released to you</Link>
      </p>
      <header className="border-b border-rule pb-3">
        <p className="font-mono text-note text-ink-soft">
          {rev.documentNumber} · revision {rev.letter}
        </p>
        <h1 className="text-title font-semibold">{rev.title}</h1>
        <p className="text-note text-ink-soft">
          Frozen {formatDateTime(rev.frozenAt)} · released to you {formatDateTime(rev.releasedAt)} by {rev.releasedBy}
        </p>
      </header>
      <div className="grid gap-4 md:grid-cols-[2fr_1fr]">
        <div className="space-y-4">
          <section className="sheet p-4" aria-label="Cover note">
            <h2 className="label">Cover note</h2>
            <p className="whitespace-pre-wrap text-body">{rev.releases[0]?.coverNote}</p>
          </section>
          <section className="sheet p-4" aria-label="Change summary">
            <h2 className="label">Change summary of revision {rev.letter}</h2>
            <p className="text-body">{rev.changeSummary}</p>
          </section>
          <section className="sheet p-4" aria-label="Revision record">
            <h2 className="label">Revision record</h2>
            <table className="w-full text-left text-note">
              <thead className="text-micro uppercase text-ink-soft">
                <tr>
                  <th className="py-1 pr-3">Rev.</th>
                  <th className="py-1 pr-3">Date</th>
                  <th className="py-1 pr-3">Description</th>
                  <th className="py-1 pr-3">Author</th>
                  <th className="py-1 pr-3">Reviewed by</th>
                  <th className="py-1">Released by</th>
                </tr>
              </thead>
              <tbody>
                {rev.revisionRecord.map((r) => (
                  <tr key={r.letter} className="border-t border-rule align-top">
                    <td className="py-1 pr-3 font-semibold">{r.letter}</td>
                    <td className="py-1 pr-3 whitespace-nowrap">{r.date}</td>
                    <td className="py-1 pr-3">{r.summary}</td>
                    <td className="py-1 pr-3">{r.author}</td>
                    <td className="py-1 pr-3">{r.reviewers}</td>
                    <td className="py-1">{r.releasedBy}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <h2 className="label mt-4">Approval</h2>
            <ul className="text-note">
              <li>Author: {rev.approval.author}</li>
              {rev.approval.reviewers.map((r) => (
                <li key={r.name}>
                  Reviewer: {r.name}, {r.decision === 'approve' ? 'approved' : r.decision} {formatDateTime(r.decidedAt)}
                </li>
              ))}
              <li>
                Configuration manager: {rev.approval.configurationManager}, frozen{' '}
                {formatDateTime(rev.approval.frozenAt)}
              </li>
            </ul>
            {rev.approval.signatures.length > 0 && (
              <>
                <h2 className="label mt-4">Electronic signatures</h2>
                <ul className="text-note" aria-label="Electronic signatures">
                  {rev.approval.signatures.map((s, i) => (
                    <li key={i}>
                      <span className="font-semibold">{s.name}</span> ({s.role}) — {s.meaning},{' '}
                      {formatDateTime(s.signedAt)}
                    </li>
                  ))}
                </ul>
              </>
            )}
          </section>
        </div>
        <aside className="space-y-4">
          <section className="sheet p-4" aria-label="Document">
            <h2 className="label">Document</h2>
            <a
              href={`/api/memos/${rev.memoId}/revisions/${rev.letter}/pdf`}
              className="btn-primary no-underline"
              download={pdfFileName({ documentNumber: rev.documentNumber, revisionLetter: rev.letter })}
            >
              Download PDF ({kib} KiB)
            </a>
            <p className="mt-2 break-all font-mono text-micro text-ink-soft" title="SHA-256 of the stored PDF">
              SHA-256 {rev.pdfSha256}
            </p>
          </section>
          {(rev.opmSha256 || rev.oemSha256) && (
            <section className="sheet p-4" aria-label="Orbit data">
              <h2 className="label">Orbit data (CCSDS, EME2000)</h2>
              <p className="mb-2 text-note text-ink-soft">
                The design orbit as frozen in this revision, for flight-dynamics tools: the state as an Orbit Parameter
                Message and one day of its numerical check as an Orbit Ephemeris Message (KVN text). Preliminary-design
                values.
              </p>
              <ul className="space-y-2">
                {rev.opmSha256 && (
                  <li>
                    <a href={`/api/memos/${rev.memoId}/revisions/${rev.letter}/opm`} className="btn-quiet no-underline">
                      Download OPM (design state)
                    </a>
                    <p className="mt-1 break-all font-mono text-micro text-ink-soft" title="SHA-256 of the stored OPM">
                      SHA-256 {rev.opmSha256}
                    </p>
                  </li>
                )}
                {rev.oemSha256 && (
                  <li>
                    <a href={`/api/memos/${rev.memoId}/revisions/${rev.letter}/oem`} className="btn-quiet no-underline">
                      Download OEM (one day, 60 s)
                    </a>
                    <p className="mt-1 break-all font-mono text-micro text-ink-soft" title="SHA-256 of the stored OEM">
                      SHA-256 {rev.oemSha256}
                    </p>
                  </li>
                )}
              </ul>
            </section>
          )}
          <section className="sheet p-4" aria-label="Receipt">
            <h2 className="label">Receipt</h2>
            <AcknowledgeButton memoId={rev.memoId} letter={rev.letter} acknowledgedAt={rev.acknowledgedAt} />
          </section>
        </aside>
      </div>
    </div>
  );
}

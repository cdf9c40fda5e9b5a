'use client';

import Link from 'next/link';
import { useState } from 'react';
import type { RevisionSummary } from '@/lib/revisions/revision-record';
import type { ReverifyReport } from '@/lib/revisions/reverify-revision';
import { postJson } from '@/lib/client/fetch-json';
import { formatDateTime } from '@/lib/format/format-date';

/** Frozen revisions: letter, date, who, summary; the stored PDF, re-verification against the current engine, comparison. */
export function RevisionsPanel({
  memoId,
  revisions,
  canReverify,
}: {
  memoId: number;
  revisions: RevisionSummary[];
  canReverify: boolean;
}) {
  const [reports, setReports] = useState<Record<string, ReverifyReport | string>>({});
  if (revisions.length === 0) return null;
  async function reverify(letter: string) {
    setReports((r) => ({ ...r, [letter]: 'Recomputing…' }));
    const res = await postJson<ReverifyReport>(`/api/memos/${memoId}/revisions/${letter}/reverify`, {});
    setReports((r) => ({ ...r, [letter]: res.ok ? res.data : res.error }));
  }
  return (
    <section aria-label="Frozen revisions" className="text-note">
      <h2 className="label">Frozen revisions</h2>
      <ol className="space-y-2">
        {revisions.map((r) => {
          const report = reports[r.letter];
          return (
            <li key={r.letter} className="rounded-card border border-orbit-100 bg-orbit-50 p-2">
              <div className="flex items-baseline justify-between gap-2">
                <span className="font-semibold text-orbit-700">Revision {r.letter}</span>
                <span className="text-micro text-ink-faint">v{r.memoVersion}</span>
              </div>
              <p className="text-micro text-ink-soft">
                {formatDateTime(r.frozenAt)} · {r.frozenBy.name}
              </p>
              <p className="mt-1">{r.changeSummary}</p>
              <p className="mt-1 break-all font-mono text-micro text-ink-faint" title="SHA-256 of the stored PDF">
                sha256 {r.pdfSha256.slice(0, 16)}…
              </p>
              <div className="mt-1 flex flex-wrap gap-3 text-micro">
                <a href={`/api/memos/${memoId}/revisions/${r.letter}/pdf`} target="_blank" rel="noreferrer">
                  PDF
                </a>
                <Link href={`/memos/${memoId}/compare?from=r${r.letter}&to=current`}>Compare with current</Link>
                {canReverify && (
                  <button
                    type="button"
                    className="text-orbit-600 underline-offset-2 hover:underline"
                    onClick={() => void reverify(r.letter)}
                  >
                    Re-verify numbers
                  </button>
                )}
              </div>
              {typeof report === 'string' && (
                <p className="mt-1 text-micro text-ink-soft" role="status">
                  {report}
                </p>
              )}
              {report && typeof report !== 'string' && (
                <div className="mt-1 text-micro" role="status">
                  {report.differences.length === 0 && report.failures.length === 0 ? (
                    <p className="text-moss-700">
                      ✓ All {report.checkedOutputs} outputs agree with {report.currentEngineVersion} at display
                      precision.
                    </p>
                  ) : (
                    <>
                      <p className="text-ember-700">
                        {report.differences.length} output(s) differ, {report.failures.length} block(s) fail with{' '}
                        {report.currentEngineVersion} (frozen with {report.frozenEngineVersion}):
                      </p>
                      <ul className="list-disc pl-4">
                        {report.differences.map((d) => (
                          <li key={`${d.blockId}.${d.output}`}>
                            {d.block} · {d.label}: {String(d.frozen)} → {String(d.now)} {d.unit ?? ''}
                            {d.reasons.length > 0 ? (
                              <span className="block text-ink-soft">Moved by engine {d.reasons.join(' · ')}</span>
                            ) : (
                              <span className="block text-ink-soft">
                                No recorded engine change explains this difference.
                              </span>
                            )}
                          </li>
                        ))}
                        {report.failures.map((f) => (
                          <li key={f.blockId}>
                            {f.block}: {f.error}
                          </li>
                        ))}
                      </ul>
                    </>
                  )}
                </div>
              )}
            </li>
          );
        })}
      </ol>
    </section>
  );
}

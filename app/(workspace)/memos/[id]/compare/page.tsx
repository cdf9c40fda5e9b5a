import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { parseId } from '@/lib/api/route-handler';
import { getMemo } from '@/lib/memos/get-memo';
import { listMemoVersions } from '@/lib/memos/list-memo-versions';
import { listRevisions } from '@/lib/revisions/list-revisions';
import { compareVersions, parseVersionRef, type Comparison } from '@/lib/revisions/compare-versions';
import { lastReviewedVersion, type LastReviewed } from '@/lib/revisions/last-reviewed-version';
import { BlockChanges } from '@/components/revisions/BlockChanges';
import { ChangeNavigator } from '@/components/revisions/ChangeNavigator';
import { Problem, problemFor } from '@/components/shell/Problem';
import { formatDateTime, formatTimeSpan } from '@/lib/format/format-date';
import { editingSessionBase } from '@/lib/memos/editing-session-base';
import type { MemoVersionSummary } from '@/lib/memos/memo-record';

export const metadata: Metadata = { title: 'Compare' };
export const dynamic = 'force-dynamic';

type CompareOption = { value: string; label: string } | { group: string; options: { value: string; label: string }[] };
type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function ComparePage({ params, searchParams }: Props) {
  const { id } = await params;
  const q = await searchParams;
  const actor = await requirePageActor(`/memos/${id}/compare`);
  const str = (v: string | string[] | undefined, d: string) => (typeof v === 'string' && v ? v : d);
  let result: {
    comparison: Comparison;
    options: CompareOption[];
    title: string;
    memoId: number;
    from: string;
    to: string;
    sinceReview: LastReviewed | null;
  };
  try {
    const memoId = parseId(id, 'memo id');
    const memo = await getMemo(actor, memoId);
    // Unless asked otherwise, a person who has reviewed this memo sees what changed since the version they last reviewed.
    const reviewed = await lastReviewedVersion(actor.id, memoId);
    const sinceReview = !q.from && reviewed && reviewed.versionNumber < memo.version ? reviewed : null;
    const [sessions, saves, revisions] = await Promise.all([
      listMemoVersions(actor, memoId),
      listMemoVersions(actor, memoId, { everySave: true }),
      listRevisions(actor, memoId),
    ]);
    // Otherwise: what the current editing session changed (from the history entry before it).
    const from = str(
      q.from,
      `v${sinceReview ? sinceReview.versionNumber : editingSessionBase(sessions, memo.version)}`,
    );
    const to = str(q.to, 'current');
    const comparison = await compareVersions(actor, memoId, parseVersionRef(from, 'from'), parseVersionRef(to, 'to'));
    const versionOption = (v: MemoVersionSummary) => ({
      value: `v${v.versionNumber}`,
      label: `Version ${v.versionNumber}${v.label ? ` “${v.label}”` : ''} — ${v.author.name}, ${formatDateTime(v.createdAt)}`,
    });
    // Every save can be compared; the saves of one editing session are listed under it.
    const options: CompareOption[] = [
      { value: 'current', label: `Current (version ${memo.version})` },
      ...revisions.map((r) => ({
        value: `r${r.letter}`,
        label: `Revision ${r.letter} — ${formatDateTime(r.frozenAt)}`,
      })),
      ...sessions.map((s): CompareOption => {
        if (s.saveCount === 1) return versionOption(s);
        const inSession = saves.filter(
          (v) => v.versionNumber >= s.firstVersionNumber && v.versionNumber <= s.versionNumber,
        );
        return {
          group: `${s.label ? `“${s.label}”, ` : ''}${s.author.name}: ${s.saveCount} saves, ${formatTimeSpan(s.startedAt, s.createdAt)}`,
          options: inSession.map(versionOption),
        };
      }),
    ];
    result = { comparison, options, title: memo.title, memoId, from, to, sinceReview };
  } catch (err) {
    const p = problemFor(err);
    if (p) return <Problem {...p} />;
    throw err;
  }
  const { comparison: c } = result;
  const changedText = c.blocks.some((b) => b.op !== 'equal');
  const changeCount = c.blocks.filter((b) => b.op !== 'equal').length + c.outputs.length;
  const since = result.sinceReview;
  return (
    <div className="space-y-6">
      <div>
        <p className="text-note">
          <Link href={`/memos/${result.memoId}`}>← {result.title}</Link>
        </p>
        <h1 className="text-title font-semibold">
          Compare {c.from} with {c.to}
        </h1>
        {since && (
          <p className="mt-1 text-note text-ink-soft" data-since-review>
            Changes since your last review: version {since.versionNumber}, the version{' '}
            {since.basis === 'decision' ? 'you gave your verdict on' : 'current when you last commented'} (
            {formatDateTime(since.at)}).
          </p>
        )}
      </div>
      <ChangeNavigator total={changeCount} />
      <form className="sheet flex flex-wrap items-end gap-3 p-3" method="get">
        {(['from', 'to'] as const).map((side) => (
          <div key={side} className="min-w-0 max-w-full">
            <label htmlFor={`cmp-${side}`} className="label">
              {side === 'from' ? 'Older' : 'Newer'}
            </label>
            <select
              id={`cmp-${side}`}
              name={side}
              defaultValue={result[side]}
              className="field w-full max-w-80 sm:w-80"
            >
              {result.options.map((o) =>
                'group' in o ? (
                  <optgroup key={`group-${o.options[0]?.value}`} label={o.group}>
                    {o.options.map((v) => (
                      <option key={v.value} value={v.value}>
                        {v.label}
                      </option>
                    ))}
                  </optgroup>
                ) : (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ),
              )}
            </select>
          </div>
        ))}
        <button type="submit" className="btn-primary">
          Compare
        </button>
      </form>

      <section aria-label="Changed numbers" className="sheet p-4">
        <h2 className="mb-2 text-body font-semibold">Calc outputs that changed ({c.outputs.length})</h2>
        {c.outputs.length === 0 ? (
          <p className="text-note text-ink-soft">No output changed beyond its display precision.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full text-note">
              <thead className="border-b border-rule text-left text-micro uppercase text-ink-soft">
                <tr>
                  <th className="py-1">Block</th>
                  <th>Output</th>
                  <th className="text-right">{c.from}</th>
                  <th className="text-right">{c.to}</th>
                </tr>
              </thead>
              <tbody>
                {c.outputs.map((o) => (
                  <tr
                    key={`${o.blockId}.${o.output}`}
                    data-change="output"
                    className="border-b border-rule outline-offset-1 last:border-0 data-[change-current]:outline data-[change-current]:outline-2 data-[change-current]:outline-orbit-500"
                  >
                    <td className="py-1">{o.block}</td>
                    <td>{o.label}</td>
                    <td className="text-right font-mono text-ember-700 line-through decoration-1">{o.from}</td>
                    <td className="text-right font-mono text-moss-700">{o.to}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
        {c.inputs.length > 0 && (
          <>
            <h3 className="mb-1 mt-4 text-note font-semibold">Inputs that changed ({c.inputs.length})</h3>
            <ul className="space-y-0.5 text-note">
              {c.inputs.map((i) => (
                <li key={`${i.blockId}.${i.input}`}>
                  {i.block} · {i.label}: <span className="font-mono text-ember-700 line-through">{i.from}</span> →{' '}
                  <span className="font-mono text-moss-700">{i.to}</span>
                </li>
              ))}
            </ul>
          </>
        )}
      </section>

      <section aria-label="Text differences" className="sheet p-4">
        <h2 className="mb-2 text-body font-semibold">Text</h2>
        {!changedText && <p className="mb-2 text-note text-ink-soft">The text is the same.</p>}
        <BlockChanges blocks={c.blocks} />
      </section>
    </div>
  );
}

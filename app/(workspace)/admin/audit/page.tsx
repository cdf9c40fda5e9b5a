import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { AUDIT_ACTIONS } from '@/lib/audit/record-audit';
import { AUDIT_ACTION_LABELS } from '@/lib/audit/describe-audit-event';
import { Problem } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Audit trail' };
export const dynamic = 'force-dynamic';

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function AuditPage({ searchParams }: Props) {
  const actor = await requirePageActor('/admin/audit');
  const decision = decideGlobal(actor, 'audit.view');
  if (!decision.allowed) return <Problem title="Not available to you" message={decision.reason} />;
  const raw = Object.fromEntries(
    Object.entries(await searchParams).filter(([, v]) => typeof v === 'string' && v !== ''),
  ) as Record<string, string>;
  const parsed = auditQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : auditQuerySchema.parse({});
  const events = await listAuditEvents(actor, query);
  const older = events.length === query.limit ? events[events.length - 1].id : null;
  const filters = Object.fromEntries(
    Object.entries(raw).filter(([k]) => k !== 'before' && k !== 'format' && k !== 'limit'),
  );
  const csvHref = `/api/audit?${new URLSearchParams({ ...filters, format: 'csv', limit: '5000' }).toString()}`;
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-title font-semibold">Audit trail</h1>
        <p className="text-note text-ink-soft">
          Every sign-in, save, transition, electronic signature, comment, freeze, re-verification, PDF download,
          delivery and change of people, newest first. Entries cannot be edited. Times are UTC.
        </p>
      </div>
      <form method="get" className="sheet flex flex-wrap items-end gap-3 p-3" aria-label="Filter">
        <div>
          <label htmlFor="f-document" className="label">
            Document number
          </label>
          <input
            id="f-document"
            name="document"
            defaultValue={query.document ?? ''}
            className="field w-44"
            placeholder="BWO-TL1-DM-001"
          />
        </div>
        <div>
          <label htmlFor="f-person" className="label">
            Person (name or e-mail)
          </label>
          <input id="f-person" name="person" defaultValue={query.person ?? query.actor ?? ''} className="field w-52" />
        </div>
        <div>
          <label htmlFor="f-action" className="label">
            Action
          </label>
          <select id="f-action" name="action" defaultValue={query.action ?? ''} className="field w-72 max-w-full">
            <option value="">All actions</option>
            {[...AUDIT_ACTIONS]
              .sort((a, b) => AUDIT_ACTION_LABELS[a].localeCompare(AUDIT_ACTION_LABELS[b]))
              .map((a) => (
                <option key={a} value={a}>
                  {AUDIT_ACTION_LABELS[a]}
                </option>
              ))}
          </select>
        </div>
        <div>
          <label htmlFor="f-from" className="label">
            From (UTC)
          </label>
          <input id="f-from" name="from" type="date" defaultValue={query.from ?? ''} className="field w-40" />
        </div>
        <div>
          <label htmlFor="f-to" className="label">
            To (UTC)
          </label>
          <input id="f-to" name="to" type="date" defaultValue={query.to ?? ''} className="field w-40" />
        </div>
        <button type="submit" className="btn-primary">
          Filter
        </button>
        <Link href="/admin/audit" className="btn-quiet no-underline">
          Clear
        </Link>
        <a href={csvHref} className="btn-quiet ml-auto no-underline" download>
          Export CSV
        </a>
        {!parsed.success && (
          <p role="alert" className="w-full text-note text-ember-700">
            Some filters were not understood and were ignored:{' '}
            {parsed.error.issues.map((i) => `${i.path.join('.') || 'filter'} — ${i.message}`).join('; ')}.
          </p>
        )}
      </form>
      <div className="sheet overflow-x-auto">
        <table className="w-full text-left text-note">
          <thead className="border-b border-rule bg-paper-sunk text-micro uppercase text-ink-soft">
            <tr>
              <th className="px-3 py-2">When (UTC)</th>
              <th className="px-3 py-2">Who</th>
              <th className="px-3 py-2">Document</th>
              <th className="px-3 py-2">What happened</th>
            </tr>
          </thead>
          <tbody>
            {events.map((e) => (
              <tr key={e.id} className="border-b border-rule last:border-0 align-top">
                <td className="whitespace-nowrap px-3 py-1.5">{formatDateTime(e.at)}</td>
                <td className="px-3 py-1.5">
                  {e.actorName ?? '—'}
                  {e.actorEmail && <span className="block font-mono text-micro text-ink-faint">{e.actorEmail}</span>}
                </td>
                <td className="whitespace-nowrap px-3 py-1.5">
                  {e.memoId ? <Link href={`/memos/${e.memoId}`}>{e.documentNumber ?? `memo ${e.memoId}`}</Link> : '—'}
                  {e.revisionLetter ? ` · rev ${e.revisionLetter}` : ''}
                </td>
                <td className="max-w-xl px-3 py-1.5">
                  {e.summary}
                  <span className="ml-2 font-mono text-micro text-ink-faint">{e.action}</span>
                </td>
              </tr>
            ))}
            {events.length === 0 && (
              <tr>
                <td colSpan={4} className="px-3 py-8 text-center text-ink-soft">
                  No events match these filters.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      {older && (
        <p>
          <Link href={`/admin/audit?${new URLSearchParams({ ...raw, before: String(older) }).toString()}`}>
            Older events →
          </Link>
        </p>
      )}
    </div>
  );
}

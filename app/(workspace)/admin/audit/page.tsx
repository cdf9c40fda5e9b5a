import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { AUDIT_ACTIONS } from '@/lib/audit/record-audit';
import { Problem } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Audit trail' };
export const dynamic = 'force-dynamic';

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function AuditPage({ searchParams }: Props) {
  const actor = await requirePageActor('/admin/audit');
  const decision = decideGlobal(actor, 'audit.view');
  if (!decision.allowed) return <Problem title="Not available to you" message={decision.reason} />;
  const raw = Object.fromEntries(Object.entries(await searchParams).filter(([, v]) => typeof v === 'string' && v !== '')) as Record<string, string>;
  const parsed = auditQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : auditQuerySchema.parse({});
  const events = await listAuditEvents(actor, query);
  const older = events.length === query.limit ? events[events.length - 1].id : null;
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-title font-semibold">Audit trail</h1>
        <p className="text-note text-ink-soft">Every sign-in, save, transition, freeze, re-verification, PDF download and change of people, newest first. Entries cannot be edited.</p>
      </div>
      <form method="get" className="sheet flex flex-wrap items-end gap-3 p-3" aria-label="Filter">
        <div>
          <label htmlFor="f-action" className="label">Action</label>
          <select id="f-action" name="action" defaultValue={query.action ?? ''} className="field w-52">
            <option value="">All actions</option>
            {AUDIT_ACTIONS.map((a) => (
              <option key={a} value={a}>{a}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="f-actor" className="label">Person (e-mail contains)</label>
          <input id="f-actor" name="actor" defaultValue={query.actor ?? ''} className="field w-64" />
        </div>
        <div>
          <label htmlFor="f-memo" className="label">Memo id</label>
          <input id="f-memo" name="memoId" defaultValue={query.memoId ?? ''} className="field w-28" inputMode="numeric" />
        </div>
        <button type="submit" className="btn-primary">Filter</button>
        {!parsed.success && <p role="alert" className="text-note text-ember-700">Some filters were not understood and were ignored.</p>}
      </form>
      <div className="sheet overflow-x-auto">
        <table className="w-full text-left text-note">
          <thead className="border-b border-rule bg-paper-sunk text-micro uppercase text-ink-soft">
            <tr><th className="px-3 py-2">When</th><th className="px-3 py-2">Who</th><th className="px-3 py-2">Action</th><th className="px-3 py-2">Memo / revision</th><th className="px-3 py-2">Details</th></tr>
          </thead>
          <tbody>
            {events.map((e) => (
              <tr key={e.id} className="border-b border-rule last:border-0 align-top">
                <td className="whitespace-nowrap px-3 py-1.5">{formatDateTime(e.at)}</td>
                <td className="px-3 py-1.5 font-mono text-micro">{e.actorEmail ?? '—'}</td>
                <td className="px-3 py-1.5">{e.action}</td>
                <td className="px-3 py-1.5">{e.memoId ? <Link href={`/memos/${e.memoId}`}>memo {e.memoId}</Link> : '—'}{e.revisionLetter ? ` · rev ${e.revisionLetter}` : ''}</td>
                <td className="max-w-md break-words px-3 py-1.5 font-mono text-micro text-ink-soft">{e.details ? JSON.stringify(e.details) : ''}</td>
              </tr>
            ))}
            {events.length === 0 && (
              <tr><td colSpan={5} className="px-3 py-8 text-center text-ink-soft">No events match these filters.</td></tr>
            )}
          </tbody>
        </table>
      </div>
      {older && (
        <p>
          <Link href={`/admin/audit?${new URLSearchParams({ ...raw, before: String(older) }).toString()}`}>Older events →</Link>
        </p>
      )}
    </div>
  );
}

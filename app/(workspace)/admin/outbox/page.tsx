import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { listOutboxMessages } from '@/lib/mail/list-outbox-messages';
import { mailConfig } from '@/lib/mail/mail-config';
import { Problem } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Outbox' };
export const dynamic = 'force-dynamic';

/** Every message the built-in SMTP server received, newest first. */
export default async function OutboxPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePageActor('/admin/outbox');
  const d = decideGlobal(actor, 'outbox.view');
  if (!d.allowed) return <Problem title="Not available to you" message={d.reason} />;
  const to = (await searchParams).to;
  const filter = typeof to === 'string' && to.trim() ? to.trim().slice(0, 320) : undefined;
  const messages = await listOutboxMessages(actor, { to: filter });
  const external = mailConfig().smtpUrl !== null;
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-title font-semibold">Outbox</h1>
        <p className="text-note text-ink-soft">
          {external
            ? 'Mail goes to the SMTP server named by SMTP_URL; this list only holds what the built-in server received before that was set.'
            : 'No SMTP_URL is set, so every message Nodewright sends is received by its built-in SMTP server and kept here: headers, bodies and attachments.'}
        </p>
      </div>
      <form method="get" className="sheet flex flex-wrap items-end gap-3 p-3" aria-label="Filter">
        <div>
          <label htmlFor="f-to" className="label">
            Recipient contains
          </label>
          <input id="f-to" name="to" defaultValue={filter ?? ''} className="field w-72" />
        </div>
        <button type="submit" className="btn-primary">
          Filter
        </button>
      </form>
      <div className="sheet overflow-x-auto">
        <table className="w-full text-left text-note">
          <thead className="border-b border-rule bg-paper-sunk text-micro uppercase text-ink-soft">
            <tr>
              <th className="px-3 py-2">Received</th>
              <th className="px-3 py-2">To</th>
              <th className="px-3 py-2">Subject</th>
              <th className="px-3 py-2">Attachments</th>
            </tr>
          </thead>
          <tbody>
            {messages.map((m) => (
              <tr key={m.id} className="border-b border-rule last:border-0 align-top">
                <td className="whitespace-nowrap px-3 py-1.5">{formatDateTime(m.receivedAt)}</td>
                <td className="px-3 py-1.5 font-mono text-micro">{m.envelopeTo.join(', ')}</td>
                <td className="px-3 py-1.5">
                  <Link href={`/admin/outbox/${m.id}`}>{m.subject ?? '(no subject)'}</Link>
                </td>
                <td className="px-3 py-1.5">{m.attachments > 0 ? m.attachments : '—'}</td>
              </tr>
            ))}
            {messages.length === 0 && (
              <tr>
                <td colSpan={4} className="px-3 py-8 text-center text-ink-soft">
                  No messages{filter ? ' for this recipient' : ' yet'}.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}

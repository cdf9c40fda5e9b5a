import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { parseId } from '@/lib/api/route-handler';
import { getOutboxMessage } from '@/lib/mail/get-outbox-message';
import type { OutboxDetail } from '@/lib/mail/list-outbox-messages';
import { Problem, problemFor } from '@/components/shell/Problem';
import { formatDateTime } from '@/lib/format/format-date';

export const metadata: Metadata = { title: 'Outbox message' };
export const dynamic = 'force-dynamic';

/** One received message: envelope, headers, the text body, the HTML body in a sandboxed frame, attachments. */
export default async function OutboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageActor(`/admin/outbox/${id}`);
  let m: OutboxDetail;
  try {
    m = await getOutboxMessage(actor, parseId(id, 'message id'));
  } catch (err) {
    const p = problemFor(err);
    if (p) return <Problem {...p} />;
    throw err;
  }
  return (
    <div className="space-y-4">
      <p className="text-note">
        <Link href="/admin/outbox">← Outbox</Link>
      </p>
      <header>
        <h1 className="text-title font-semibold">{m.subject ?? '(no subject)'}</h1>
        <dl className="mt-2 grid grid-cols-[8rem_1fr] gap-x-3 text-note">
          <dt className="text-ink-soft">Received</dt>
          <dd>{formatDateTime(m.receivedAt)}</dd>
          <dt className="text-ink-soft">From</dt>
          <dd>{m.fromText}</dd>
          <dt className="text-ink-soft">To</dt>
          <dd>{m.toText}</dd>
          <dt className="text-ink-soft">Envelope</dt>
          <dd className="font-mono text-micro">
            MAIL FROM {m.envelopeFrom ?? '<>'} · RCPT TO {m.envelopeTo.join(', ')}
          </dd>
          <dt className="text-ink-soft">Size</dt>
          <dd>{m.rawBytes.toLocaleString('en-GB')} bytes</dd>
        </dl>
      </header>
      {m.attachmentList.length > 0 && (
        <section className="sheet p-3" aria-label="Attachments">
          <h2 className="label">Attachments</h2>
          <ul className="space-y-1 text-note">
            {m.attachmentList.map((a) => (
              <li key={a.id}>
                <a href={`/api/outbox/${m.id}/attachments/${a.id}`}>{a.filename ?? `attachment ${a.id}`}</a>{' '}
                <span className="text-ink-soft">
                  {a.contentType} · {Math.ceil(a.sizeBytes / 1024)} KiB
                </span>
                <span className="block break-all font-mono text-micro text-ink-faint">SHA-256 {a.sha256}</span>
              </li>
            ))}
          </ul>
        </section>
      )}
      {m.html && (
        <section className="sheet overflow-hidden" aria-label="HTML body">
          <h2 className="label px-3 pt-3">HTML body</h2>
          <iframe
            title="HTML body"
            sandbox="allow-popups allow-popups-to-escape-sandbox"
            srcDoc={m.html}
            className="h-96 w-full border-t border-rule bg-white"
          />
        </section>
      )}
      <section className="sheet p-3" aria-label="Text body">
        <h2 className="label">Text body</h2>
        <pre className="whitespace-pre-wrap break-words font-mono text-note">{m.text ?? ''}</pre>
      </section>
      <details className="sheet p-3">
        <summary className="cursor-pointer text-note font-semibold">Headers ({m.headers.length})</summary>
        <table className="mt-2 w-full text-left font-mono text-micro">
          <tbody>
            {m.headers.map(([k, v], i) => (
              <tr key={i} className="align-top">
                <th className="whitespace-nowrap pr-3 font-semibold">{k}</th>
                <td className="break-all">{v}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </div>
  );
}

'use client';

import { useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import { postJson, requestJson } from '@/lib/client/fetch-json';
import { formatDateTime } from '@/lib/format/format-date';
import type { DeliveryRecord } from '@/lib/delivery/delivery-record';
import type { DeliveryPanelData } from '@/lib/delivery/load-delivery-panel';

type Props = DeliveryPanelData & { memoId: number };

type Problem = { text: string; fields: Record<string, string> } | null;

const when = (iso: string | null) => (iso ? formatDateTime(iso) : '—');

function DeliveryCell({ d }: { d: DeliveryRecord }) {
  if (d.status === 'delivered')
    return (
      <span className="text-moss-700">
        ✓ {when(d.deliveredAt)}
        {d.pdfAttached === false ? ' · link only' : ''}
      </span>
    );
  if (d.status === 'failed') {
    return (
      <span className="text-ember-700">
        ✗ not delivered: <span className="font-mono text-micro">{d.error}</span>
        <span className="block text-micro text-ink-soft">
          {d.nextAttemptAt
            ? `automatic retry ${when(d.nextAttemptAt)} (attempt ${d.attempts + 1})`
            : `no automatic retries left after ${d.attempts} attempts`}
        </span>
      </span>
    );
  }
  return <span className="text-ink-soft">{d.status === 'sending' ? 'sending…' : 'queued'}</span>;
}

/** The memo's distribution list, the release form and, per revision, what happened to each recipient's message. */
export function DeliveryPanel({ memoId, letters, contacts, customers, tracking, canDistribute, canRelease }: Props) {
  const router = useRouter();
  const [problem, setProblem] = useState<Problem>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [releasing, setReleasing] = useState(false);

  async function run(call: () => ReturnType<typeof requestJson>, done: (data: unknown) => string | null) {
    setBusy(true);
    setProblem(null);
    setNotice(null);
    const res = await call();
    setBusy(false);
    if (!res.ok) return setProblem({ text: res.error, fields: res.fields });
    setNotice(done(res.data));
    router.refresh();
  }

  function addExisting(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const userId = Number(new FormData(e.currentTarget).get('userId'));
    void run(
      () => postJson(`/api/memos/${memoId}/distribution`, { userId }),
      () => null,
    );
  }
  function invite(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const form = e.currentTarget;
    void run(
      () =>
        postJson(`/api/memos/${memoId}/distribution`, {
          email: String(f.get('email') ?? ''),
          name: String(f.get('name') ?? ''),
        }),
      (data) => {
        form.reset();
        const inv = (data as { invitation: { sent: boolean; error?: string } | null }).invitation;
        return inv && !inv.sent
          ? `Added, but the invitation could not be sent: ${inv.error}. Use “Send invitation again”.`
          : 'Invitation sent.';
      },
    );
  }
  function release(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const letter = String(f.get('letter') ?? letters[0]);
    const recipientIds = f.getAll('recipientIds').map(Number);
    void run(
      () =>
        postJson(`/api/memos/${memoId}/revisions/${letter}/releases`, {
          recipientIds,
          coverNote: String(f.get('coverNote') ?? ''),
        }),
      (data) => {
        setReleasing(false);
        const ds = (data as { deliveries: DeliveryRecord[] }).deliveries;
        const failed = ds.filter((d) => d.status !== 'delivered').length;
        return failed === 0
          ? `Revision ${letter} released; ${ds.length} message${ds.length === 1 ? '' : 's'} handed to the mail server.`
          : `Revision ${letter} released and recorded, but ${failed} of ${ds.length} message${ds.length === 1 ? '' : 's'} could not be delivered yet; see below.`;
      },
    );
  }

  const onList = new Set(contacts.map((c) => c.userId));
  const addable = customers.filter((c) => !onList.has(c.id));
  const fieldNote = (name: string) =>
    problem?.fields[name] && <p className="mt-1 text-micro text-ember-700">{problem.fields[name]}</p>;

  return (
    <section aria-label="Delivery to customers" className="sheet mb-4 p-3 text-note">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="text-body font-semibold">Delivery to customers</h2>
        {canRelease && letters.length > 0 && contacts.length > 0 && (
          <button
            type="button"
            className="btn-primary ml-auto"
            aria-expanded={releasing}
            onClick={() => setReleasing(!releasing)}
          >
            Release revision {letters[0]}…
          </button>
        )}
      </div>

      {problem && (
        <p role="alert" className="mt-2 rounded-chip border border-ember-500 bg-ember-50 px-3 py-2 text-ember-700">
          {problem.text}
        </p>
      )}
      {notice && (
        <p role="status" className="mt-2 rounded-chip border border-rule bg-paper-sunk px-3 py-2">
          {notice}
        </p>
      )}

      {releasing && (
        <form
          onSubmit={release}
          className="mt-3 space-y-3 rounded-card border border-orbit-100 bg-orbit-50 p-3"
          aria-label="Release"
        >
          <div className="flex flex-wrap gap-6">
            <div>
              <label htmlFor="release-letter" className="label">
                Revision
              </label>
              <select id="release-letter" name="letter" className="field w-28" defaultValue={letters[0]}>
                {letters.map((l) => (
                  <option key={l} value={l}>
                    {l}
                  </option>
                ))}
              </select>
            </div>
            <fieldset>
              <legend className="label">Recipients</legend>
              {contacts.map((c) => (
                <label key={c.userId} className="mr-4 inline-flex items-center gap-1.5">
                  <input type="checkbox" name="recipientIds" value={c.userId} defaultChecked /> {c.name}
                  {c.state !== 'active' && <span className="text-micro text-sunline-700">({c.state})</span>}
                </label>
              ))}
              {fieldNote('recipientIds')}
            </fieldset>
          </div>
          <div>
            <label htmlFor="cover-note" className="label">
              Cover note
            </label>
            <textarea
              id="cover-note"
              name="coverNote"
              rows={3}
              className="field"
              placeholder="What this revision is for and what you would like the customer to do with it."
            />
            {fieldNote('coverNote')}
          </div>
          <div className="flex gap-2">
            <button type="submit" className="btn-primary" disabled={busy}>
              {busy ? 'Releasing…' : 'Release and send'}
            </button>
            <button type="button" className="btn-quiet" onClick={() => setReleasing(false)}>
              Cancel
            </button>
          </div>
        </form>
      )}

      <div className="mt-3 grid gap-4 md:grid-cols-[1fr_2fr]">
        <div>
          <h3 className="label">Distribution list</h3>
          {contacts.length === 0 ? (
            <p className="text-ink-soft">No customer contacts yet.</p>
          ) : (
            <ul className="space-y-1" aria-label="Distribution list">
              {contacts.map((c) => (
                <li key={c.userId} className="flex flex-wrap items-baseline gap-2">
                  <span className="font-medium">{c.name}</span>
                  <span className="font-mono text-micro text-ink-soft">{c.email}</span>
                  {c.state !== 'active' && (
                    <span className="rounded-chip border border-sunline-500 px-1 text-micro text-sunline-700">
                      {c.state === 'invited' ? 'invitation pending' : 'inactive'}
                    </span>
                  )}
                  {canDistribute && c.state === 'invited' && (
                    <button
                      type="button"
                      className="text-micro text-orbit-600 hover:underline"
                      disabled={busy}
                      onClick={() =>
                        void run(
                          () => postJson(`/api/memos/${memoId}/distribution/${c.userId}/invitation`, {}),
                          (d) =>
                            (d as { sent: boolean; error?: string }).sent
                              ? 'Invitation sent again.'
                              : `The invitation could not be sent: ${(d as { error?: string }).error}`,
                        )
                      }
                    >
                      Send invitation again
                    </button>
                  )}
                  {canDistribute && (
                    <button
                      type="button"
                      className="text-micro text-ember-700 hover:underline"
                      aria-label={`Remove ${c.name}`}
                      disabled={busy}
                      onClick={() =>
                        void run(
                          () => requestJson(`/api/memos/${memoId}/distribution/${c.userId}`, { method: 'DELETE' }),
                          () => `${c.name} will receive no further releases of this memo.`,
                        )
                      }
                    >
                      Remove
                    </button>
                  )}
                </li>
              ))}
            </ul>
          )}
          {canDistribute && (
            <div className="mt-3 space-y-2">
              {addable.length > 0 && (
                <form onSubmit={addExisting} className="flex items-end gap-2">
                  <div className="flex-1">
                    <label htmlFor="add-customer" className="label">
                      Add a customer
                    </label>
                    <select id="add-customer" name="userId" className="field">
                      {addable.map((c) => (
                        <option key={c.id} value={c.id}>
                          {c.name}
                        </option>
                      ))}
                    </select>
                  </div>
                  <button type="submit" className="btn-quiet" disabled={busy}>
                    Add
                  </button>
                </form>
              )}
              <form onSubmit={invite} className="space-y-2">
                <span className="label">Invite by e-mail</span>
                <input name="name" aria-label="Name" placeholder="Name" className="field" />
                {fieldNote('name')}
                <input name="email" aria-label="E-mail address" placeholder="name@customer.example" className="field" />
                {fieldNote('email')}
                <button type="submit" className="btn-quiet" disabled={busy}>
                  Invite
                </button>
              </form>
            </div>
          )}
        </div>

        <div>
          <h3 className="label">Sent</h3>
          {tracking.length === 0 && <p className="text-ink-soft">Nothing released yet.</p>}
          {tracking.map((t) => (
            <div key={t.letter} className="mb-3">
              <h4 className="font-semibold text-orbit-700">Revision {t.letter}</h4>
              {t.releases.map((r) => (
                <div key={r.id} className="mt-1 overflow-x-auto">
                  <p className="text-micro text-ink-soft">
                    Released {when(r.releasedAt)} by {r.releasedBy.name} — “
                    {r.coverNote.length > 90 ? `${r.coverNote.slice(0, 90)}…` : r.coverNote}”
                  </p>
                  <table className="mt-1 w-full text-left text-micro" aria-label={`Deliveries of revision ${t.letter}`}>
                    <thead className="text-ink-soft uppercase">
                      <tr>
                        <th className="pr-2">Recipient</th>
                        <th className="pr-2">Sent</th>
                        <th className="pr-2">Delivered to SMTP server</th>
                        <th className="pr-2">First opened</th>
                        <th className="pr-2">Acknowledged</th>
                        <th />
                      </tr>
                    </thead>
                    <tbody>
                      {r.deliveries.map((d) => (
                        <tr key={d.id} className="border-t border-rule align-top">
                          <td className="pr-2 py-1">{d.recipient.name}</td>
                          <td className="pr-2 py-1 whitespace-nowrap">{when(d.sentAt)}</td>
                          <td className="pr-2 py-1">
                            <DeliveryCell d={d} />
                          </td>
                          <td className="pr-2 py-1 whitespace-nowrap">{when(d.firstOpenedAt)}</td>
                          <td className="pr-2 py-1 whitespace-nowrap">
                            {d.acknowledgedAt ? <span className="text-moss-700">✓ {when(d.acknowledgedAt)}</span> : '—'}
                          </td>
                          <td className="py-1 whitespace-nowrap text-right">
                            {canDistribute && (
                              <button
                                type="button"
                                className="text-orbit-600 hover:underline"
                                disabled={busy}
                                onClick={() =>
                                  void run(
                                    () => postJson(`/api/deliveries/${d.id}/resend`, {}),
                                    (x) =>
                                      (x as DeliveryRecord).status === 'delivered'
                                        ? `Sent again to ${d.recipient.name}.`
                                        : `Still not delivered to ${d.recipient.name}: ${(x as DeliveryRecord).error}`,
                                  )
                                }
                              >
                                {d.status === 'failed' ? 'Retry now' : 'Resend'}
                              </button>
                            )}
                          </td>
                        </tr>
                      ))}
                    </tbody>
                  </table>
                </div>
              ))}
            </div>
          ))}
        </div>
      </div>
    </section>
  );
}

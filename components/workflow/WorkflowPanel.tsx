'use client';

import { useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import useSWR from 'swr';
import type { MemoAction } from '@/lib/auth/permissions';
import type { MemoStatus } from '@/lib/memos/memo-status';
import type { ThreadRecord } from '@/lib/comments/comment-record';
import { postJson, swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { formatDateTime } from '@/lib/format/format-date';
import { flushPendingSave } from '@/components/editor/pending-save';
import { isSignedAction } from '@/lib/signatures/signature-meaning';
import { SignDialog, type SignFields } from './SignDialog';
import { StatusTrack } from './StatusTrack';
import type { RequirementRecord } from '@/lib/requirements/list-memo-requirements';

export interface RoundDecision {
  reviewer: string;
  decision: 'approve' | 'request-changes';
  note: string | null;
  at: string;
}

type Props = {
  memoId: number;
  status: MemoStatus;
  allowedActions: MemoAction[];
  reviewerIds: number[];
  decisions: RoundDecision[];
  nextLetter: string;
  /** The signed-in person's name, shown in the signature dialog. */
  signerName: string;
};

type Open = 'none' | 'submit' | 'approve' | 'request-changes' | 'freeze' | 'reopen';

/** The memo's place in the lifecycle and the actions open to this user now. */
export function WorkflowPanel({
  memoId,
  status,
  allowedActions,
  reviewerIds,
  decisions,
  nextLetter,
  signerName,
}: Props) {
  const router = useRouter();
  const [open, setOpen] = useState<Open>('none');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ text: string; fields: Record<string, string>; status: number } | null>(null);
  const can = (a: MemoAction) => allowedActions.includes(a);
  const reviewers = useSWR<{ users: { id: number; name: string }[] }>(
    open === 'submit' ? swrKeys.users('reviewer') : null,
    swrFetcher,
  );
  // Before submit and freeze: the requirements not met, as a warning (the action stays possible).
  const requirements = useSWR<{ requirements: RequirementRecord[] }>(
    open === 'submit' || open === 'freeze' ? swrKeys.memoRequirements(memoId) : null,
    swrFetcher,
    { revalidateOnFocus: false },
  );
  const unmet = requirements.data?.requirements.filter((r) => r.warning) ?? [];
  const unmetWarning = unmet.length > 0 && (
    <div
      role="status"
      className="rounded-card border border-ember-500 bg-ember-50 px-3 py-2 text-note text-ember-700"
      data-requirement-warnings
    >
      <p className="font-semibold">
        {unmet.length === 1 ? 'One requirement is' : `${unmet.length} requirements are`} not met — you can still{' '}
        {open === 'freeze' ? 'freeze' : 'send'}; the compliance table will say so.
      </p>
      <ul className="mt-1 list-disc pl-5">
        {unmet.map((r) => (
          <li key={r.requirementId}>{r.warning}</li>
        ))}
      </ul>
    </div>
  );
  // Open threads are a warning at submit, not a refusal: the analyst may send them on (answered in the text, say) once they confirm.
  const threads = useSWR<{ threads: ThreadRecord[] }>(
    open === 'submit' ? swrKeys.memoComments(memoId) : null,
    swrFetcher,
  );
  const openThreads = threads.data?.threads.filter((t) => t.status === 'open').length ?? 0;
  const [sendWithOpen, setSendWithOpen] = useState(false);
  const unconfirmed = open === 'submit' && openThreads > 0 && !sendWithOpen;

  async function send(body: Record<string, unknown>) {
    setBusy(true);
    setError(null);
    // The memo is rebuilt after the transition (read-only once submitted): text typed within the autosave
    // delay must reach the server first, or the action waits for the writer to sort out why it did not.
    const saved = await flushPendingSave(memoId);
    if (!saved.ok) {
      setBusy(false);
      setError({ text: `Nothing was sent: ${saved.message}`, fields: {}, status: 0 });
      return;
    }
    const res = await postJson(`/api/memos/${memoId}/transitions`, body);
    setBusy(false);
    if (!res.ok) {
      setError({ text: res.error, fields: res.fields, status: res.status });
      return;
    }
    setOpen('none');
    router.refresh();
  }

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const note = String(f.get('note') ?? '').trim();
    if (unconfirmed) return;
    if (open === 'submit')
      void send({ action: 'submit', reviewerIds: f.getAll('reviewerIds').map(Number), ...(note ? { note } : {}) });
    if (open === 'reopen') void send({ action: 'reopen', ...(note ? { note } : {}) });
  }

  /** Approve, request changes and freeze are signed: the dialog sends the password and the meaning with the action's own field. */
  function onSign({ note, changeSummary, meaning, password }: SignFields) {
    if (open === 'approve') void send({ action: 'approve', ...(note ? { note } : {}), meaning, password });
    if (open === 'request-changes') void send({ action: 'request-changes', note, meaning, password });
    if (open === 'freeze') void send({ action: 'freeze', changeSummary, meaning, password });
  }

  const button = (action: Open, label: string, style = 'btn-quiet') => (
    <button
      type="button"
      className={style}
      aria-expanded={open === action}
      onClick={() => {
        setOpen(open === action ? 'none' : action);
        setError(null);
      }}
    >
      {label}
    </button>
  );

  return (
    <section aria-label="Review and baseline" className="sheet mb-4 p-3">
      <div className="flex flex-wrap items-center gap-3">
        <StatusTrack status={status} />
        <div className="ml-auto flex flex-wrap gap-2">
          {can('memo.submit') && button('submit', 'Submit for review', 'btn-primary')}
          {can('memo.decide') && button('approve', 'Approve', 'btn-primary')}
          {can('memo.decide') && button('request-changes', 'Request changes')}
          {can('memo.freeze') && button('freeze', `Freeze as revision ${nextLetter}`, 'btn-primary')}
          {can('memo.reopen') && button('reopen', 'Reopen as new draft')}
        </div>
      </div>
      {decisions.length > 0 && (
        <ul className="mt-2 space-y-0.5 text-note text-ink-soft">
          {decisions.map((d, i) => (
            <li key={i}>
              <span className={d.decision === 'approve' ? 'text-moss-700' : 'text-ember-700'}>
                {d.decision === 'approve' ? '✓ approved' : '↺ changes requested'}
              </span>{' '}
              by {d.reviewer}, {formatDateTime(d.at)}
              {d.note ? ` — “${d.note}”` : ''}
            </li>
          ))}
        </ul>
      )}
      {open !== 'none' && isSignedAction(open) && (
        <SignDialog
          key={open}
          action={open}
          nextLetter={nextLetter}
          signerName={signerName}
          busy={busy}
          error={error}
          onSign={onSign}
          onCancel={() => {
            setOpen('none');
            setError(null);
          }}
          warning={open === 'freeze' ? unmetWarning : undefined}
        />
      )}
      {(open === 'submit' || open === 'reopen') && (
        <form onSubmit={onSubmit} className="mt-3 space-y-2 border-t border-rule pt-3" noValidate>
          {open === 'submit' && (
            <fieldset>
              <legend className="label">Reviewers</legend>
              {reviewers.isLoading && <p className="text-note text-ink-faint">Loading reviewers…</p>}
              <div className="flex flex-wrap gap-3">
                {reviewers.data?.users.map((u) => (
                  <label key={u.id} className="flex items-center gap-1.5 text-note">
                    <input
                      type="checkbox"
                      name="reviewerIds"
                      value={u.id}
                      defaultChecked={reviewerIds.includes(u.id)}
                    />{' '}
                    {u.name}
                  </label>
                ))}
              </div>
              {error?.fields.reviewerIds && <p className="text-note text-ember-700">{error.fields.reviewerIds}</p>}
            </fieldset>
          )}
          <div>
            <label htmlFor="note" className="label">
              Note (optional)
            </label>
            <textarea id="note" name="note" className="field" rows={2} aria-invalid={Boolean(error?.fields.note)} />
            {error?.fields.note && <p className="text-note text-ember-700">{error.fields.note}</p>}
          </div>
          {open === 'submit' && openThreads > 0 && (
            <div
              className="rounded-chip border border-sunline-500 bg-sunline-50 px-3 py-2 text-note text-sunline-700"
              data-open-threads-warning
            >
              <p role="status">
                <span aria-hidden="true">⚠ </span>
                {openThreads === 1
                  ? 'One review thread is still open.'
                  : `${openThreads} review threads are still open.`}{' '}
                The reviewers will see {openThreads === 1 ? 'it' : 'them'} unresolved; resolve what the text now
                answers, or send as it is.
              </p>
              <label className="mt-1 flex items-center gap-1.5 font-medium">
                <input type="checkbox" checked={sendWithOpen} onChange={(e) => setSendWithOpen(e.target.checked)} />{' '}
                Send with {openThreads === 1 ? 'the open thread' : `the ${openThreads} open threads`}
              </label>
            </div>
          )}
          {unmetWarning}
          {error && !Object.keys(error.fields).length && (
            <p role="alert" className="text-note text-ember-700">
              {error.text}
            </p>
          )}
          {error && Object.keys(error.fields).length > 0 && (
            <p role="alert" className="sr-only">
              {error.text}
            </p>
          )}
          <div className="flex gap-2">
            <button
              type="submit"
              className="btn-primary"
              disabled={
                busy || (open === 'submit' && (!reviewers.data || (!threads.data && !threads.error))) || unconfirmed
              }
            >
              {busy ? 'Working…' : open === 'submit' ? 'Send to reviewers' : 'Reopen'}
            </button>
            <button type="button" className="btn-quiet" onClick={() => setOpen('none')}>
              Cancel
            </button>
          </div>
        </form>
      )}
    </section>
  );
}

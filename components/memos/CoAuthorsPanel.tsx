'use client';

import { useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import useSWR from 'swr';
import type { PersonRef } from '@/lib/memos/memo-record';
import { putJson, swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';

type Props = {
  memoId: number;
  owner: PersonRef;
  coAuthors: PersonRef[];
};

/**
 * For the memo's owner (permission memo.co-authors): choose the co-authors
 * who, with the owner, edit, submit, settle threads and reopen the memo;
 * other analysts read and comment.
 */
export function CoAuthorsPanel({ memoId, owner, coAuthors }: Props) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const analysts = useSWR<{ users: PersonRef[] }>(open ? swrKeys.users('analyst') : null, swrFetcher);
  const current = new Set(coAuthors.map((c) => c.id));

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const userIds = new FormData(e.currentTarget).getAll('coAuthorIds').map(Number);
    setBusy(true);
    setError(null);
    const res = await putJson<{ coAuthors: PersonRef[] }>(swrKeys.memoCoAuthors(memoId), { userIds });
    setBusy(false);
    if (!res.ok) {
      setError(res.error);
      return;
    }
    setOpen(false);
    router.refresh();
  }

  return (
    <>
      <button
        type="button"
        className="btn-quiet"
        aria-expanded={open}
        onClick={() => {
          setOpen(!open);
          setError(null);
        }}
      >
        Co-authors…
      </button>
      {open && (
        // basis-full: the form takes a line of its own below the page's action buttons.
        <div className="basis-full">
          <form onSubmit={onSubmit} className="sheet max-w-xl space-y-2 p-3" aria-label="Co-authors" noValidate>
            <fieldset>
              <legend className="label">Co-authors</legend>
              <p className="mb-2 text-micro text-ink-faint">
                Co-authors edit, submit, resolve threads and reopen the memo with you. Other analysts can read and
                comment.
              </p>
              {analysts.isLoading && <p className="text-note text-ink-faint">Loading analysts…</p>}
              {analysts.error && <p className="text-note text-ember-700">{String(analysts.error.message)}</p>}
              <div className="flex flex-wrap gap-3">
                {analysts.data?.users
                  .filter((u) => u.id !== owner.id)
                  .map((u) => (
                    <label key={u.id} className="flex items-center gap-1.5 text-note text-ink">
                      <input type="checkbox" name="coAuthorIds" value={u.id} defaultChecked={current.has(u.id)} />{' '}
                      {u.name}
                    </label>
                  ))}
                {analysts.data && analysts.data.users.every((u) => u.id === owner.id) && (
                  <p className="text-note text-ink-faint">No other analyst has an account yet.</p>
                )}
              </div>
            </fieldset>
            {error && (
              <p role="alert" className="text-note text-ember-700">
                {error}
              </p>
            )}
            <div className="flex gap-2">
              <button type="submit" className="btn-primary" disabled={busy || !analysts.data}>
                {busy ? 'Saving…' : 'Save co-authors'}
              </button>
              <button type="button" className="btn-quiet" onClick={() => setOpen(false)}>
                Cancel
              </button>
            </div>
          </form>
        </div>
      )}
    </>
  );
}

'use client';

import { useState } from 'react';
import { useRouter } from 'next/navigation';
import { postJson } from '@/lib/client/fetch-json';
import { formatDateTime } from '@/lib/format/format-date';

/** "Acknowledge receipt": records who and when, once. */
export function AcknowledgeButton({
  memoId,
  letter,
  acknowledgedAt,
}: {
  memoId: number;
  letter: string;
  acknowledgedAt: string | null;
}) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (acknowledgedAt) {
    return (
      <p className="rounded-chip border border-moss-500 bg-moss-50 px-3 py-2 text-note text-moss-700" role="status">
        ✓ You acknowledged receipt of revision {letter} on {formatDateTime(acknowledgedAt)}.
      </p>
    );
  }
  async function acknowledge() {
    setBusy(true);
    const res = await postJson(`/api/memos/${memoId}/revisions/${letter}/acknowledgement`, {});
    setBusy(false);
    if (!res.ok) return setError(res.error);
    router.refresh();
  }
  return (
    <div className="space-y-2">
      <button type="button" className="btn-primary" onClick={() => void acknowledge()} disabled={busy}>
        {busy ? 'Recording…' : 'Acknowledge receipt'}
      </button>
      <p className="text-micro text-ink-soft">
        Tells the configuration manager that you received revision {letter}. Your name and the time are recorded.
      </p>
      {error && (
        <p role="alert" className="text-note text-ember-700">
          {error}
        </p>
      )}
    </div>
  );
}

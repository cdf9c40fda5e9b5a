import { MEMO_STATUSES, MEMO_STATUS_LABELS, type MemoStatus } from '@/lib/memos/memo-status';

/** Where the memo stands in Draft → In review → Approved → Frozen: passed stages filled, the current one ringed. */
export function StatusTrack({ status }: { status: MemoStatus }) {
  const at = MEMO_STATUSES.indexOf(status);
  return (
    <ol className="flex items-center gap-1 text-micro uppercase" aria-label="Memo lifecycle">
      {MEMO_STATUSES.map((s, i) => (
        <li key={s} className="flex items-center gap-1" aria-current={i === at ? 'step' : undefined}>
          <span
            aria-hidden="true"
            className={`inline-block h-2.5 w-2.5 rounded-full border ${i < at ? 'border-orbit-600 bg-orbit-600' : i === at ? 'border-orbit-600 bg-paper-raised ring-2 ring-orbit-100' : 'border-rule-strong bg-paper-sunk'}`}
          />
          <span className={i === at ? 'font-semibold text-orbit-700' : i < at ? 'text-ink-soft' : 'text-ink-faint'}>
            {MEMO_STATUS_LABELS[s]}
          </span>
          {i < MEMO_STATUSES.length - 1 && <span aria-hidden="true" className="mx-1 h-px w-5 bg-rule-strong" />}
        </li>
      ))}
    </ol>
  );
}

/** The next step of the workflow in words, for the memo list. */
export const NEXT_STEP: Record<MemoStatus, string> = {
  draft: 'Analyst submits for review',
  'in-review': 'Reviewers decide',
  approved: 'Configuration manager freezes',
  frozen: 'Baseline; reopen for the next revision',
};

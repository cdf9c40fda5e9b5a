import { MEMO_STATUS_LABELS, type MemoStatus } from '@/lib/memos/memo-status';

/**
 * Status in Nodewright's own visual language: each state has a glyph as well
 * as a colour, so it reads in greyscale print and for colour-blind readers.
 */
const STYLE: Record<MemoStatus, { glyph: string; cls: string }> = {
  draft: { glyph: '○', cls: 'border-rule-strong bg-paper-sunk text-ink-soft' },
  'in-review': { glyph: '◐', cls: 'border-sunline-500 bg-sunline-50 text-sunline-700' },
  approved: { glyph: '✓', cls: 'border-moss-500 bg-moss-50 text-moss-700' },
  frozen: { glyph: '■', cls: 'border-orbit-600 bg-orbit-50 text-orbit-700' },
};

export function StatusBadge({ status }: { status: MemoStatus }) {
  const s = STYLE[status];
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-chip border px-1.5 py-0.5 text-micro font-semibold uppercase ${s.cls}`}
    >
      <span aria-hidden="true">{s.glyph}</span>
      {MEMO_STATUS_LABELS[status]}
    </span>
  );
}

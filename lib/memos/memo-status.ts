/** Lifecycle of a memo: Draft → In review → Approved → Frozen. */
export const MEMO_STATUSES = ['draft', 'in-review', 'approved', 'frozen'] as const;
export type MemoStatus = (typeof MEMO_STATUSES)[number];

export const MEMO_STATUS_LABELS: Record<MemoStatus, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  approved: 'Approved',
  frozen: 'Frozen',
};

'use client';

import { useMemo, useState } from 'react';
import Link from 'next/link';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
  type ColumnFiltersState,
} from '@tanstack/react-table';
import type { MemoSummary } from '@/lib/memos/memo-record';
import { MEMO_STATUSES, MEMO_STATUS_LABELS } from '@/lib/memos/memo-status';
import { StatusBadge } from './StatusBadge';
import { NEXT_STEP } from '@/components/workflow/StatusTrack';
import { formatDateTime } from '@/lib/format/format-date';

const col = createColumnHelper<MemoSummary>();

const columns = [
  col.accessor('documentNumber', {
    header: 'Document',
    cell: (c) => <span className="font-mono text-note">{c.getValue()}</span>,
  }),
  col.accessor('title', {
    header: 'Title',
    cell: (c) => (
      <Link href={`/memos/${c.row.original.id}`} className="font-medium text-ink">
        {c.getValue()}
      </Link>
    ),
  }),
  col.accessor('status', {
    header: 'Status',
    cell: (c) => <StatusBadge status={c.getValue()} />,
    filterFn: 'equals',
    sortingFn: (a, b) => MEMO_STATUSES.indexOf(a.original.status) - MEMO_STATUSES.indexOf(b.original.status),
  }),
  col.accessor((m) => NEXT_STEP[m.status], {
    id: 'next',
    header: 'Next step',
    cell: (c) => <span className="text-note text-ink-soft">{c.getValue()}</span>,
  }),
  col.accessor('openThreads', {
    header: 'Open threads',
    cell: (c) =>
      c.getValue() > 0 ? (
        <span
          className="rounded-chip bg-orbit-50 px-1.5 py-0.5 font-mono text-note text-orbit-700"
          aria-label={`${c.getValue()} open review threads`}
        >
          {c.getValue()}
        </span>
      ) : (
        <span className="text-ink-faint" aria-label="no open review threads">
          —
        </span>
      ),
  }),
  col.accessor((m) => m.owner.name, { id: 'owner', header: 'Owner' }),
  col.accessor('updatedAt', {
    header: 'Updated',
    cell: (c) => <time dateTime={c.getValue()}>{formatDateTime(c.getValue())}</time>,
  }),
];

export function MemoTable({ memos }: { memos: MemoSummary[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const [statusFilter, setStatusFilter] = useState<string>('');
  const columnFilters = useMemo<ColumnFiltersState>(
    () => (statusFilter ? [{ id: 'status', value: statusFilter }] : []),
    [statusFilter],
  );

  const table = useReactTable({
    data: memos,
    columns,
    state: { sorting, columnFilters },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const rows = table.getRowModel().rows;
  return (
    <div>
      <div className="mb-3 flex items-end gap-3">
        <div>
          <label htmlFor="status-filter" className="label">
            Status
          </label>
          <select
            id="status-filter"
            className="field w-44"
            value={statusFilter}
            onChange={(e) => setStatusFilter(e.target.value)}
          >
            <option value="">All statuses</option>
            {MEMO_STATUSES.map((s) => (
              <option key={s} value={s}>
                {MEMO_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </div>
        <p className="pb-2 text-note text-ink-soft" aria-live="polite">
          {rows.length} of {memos.length} memo{memos.length === 1 ? '' : 's'}
        </p>
      </div>
      <div className="sheet overflow-x-auto">
        <table className="w-full border-collapse text-left">
          <thead className="border-b border-rule bg-paper-sunk">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none'}
                      className="px-3 py-2 text-micro font-semibold uppercase text-ink-soft"
                    >
                      <button
                        type="button"
                        className="inline-flex items-center gap-1 hover:text-ink"
                        onClick={h.column.getToggleSortingHandler()}
                      >
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} className="border-b border-rule last:border-0 hover:bg-paper">
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className="px-3 py-2 align-middle text-body">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-8 text-center text-note text-ink-soft">
                  No memo has the status “
                  {MEMO_STATUS_LABELS[statusFilter as keyof typeof MEMO_STATUS_LABELS] ?? statusFilter}”.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}

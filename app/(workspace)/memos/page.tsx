import type { Metadata } from 'next';
import Link from 'next/link';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { listMemos } from '@/lib/memos/list-memos';
import { searchMemos } from '@/lib/memos/search-memos';
import { memoVisibility } from '@/lib/auth/permissions';
import { MemoTable } from '@/components/memos/MemoTable';
import { NewMemoForm } from '@/components/memos/NewMemoForm';
import { listTemplates } from '@/lib/templates';

export const metadata: Metadata = { title: 'Memos' };
export const dynamic = 'force-dynamic';

const EMPTY_TEXT: Record<string, string> = {
  customer: 'No revision has been released to you yet. When a configuration manager releases one, it appears here.',
  reviewer: 'No memo is assigned to you for review yet.',
  analyst: 'No memos yet. Start one with “New memo”.',
};

export default async function MemosPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePageActor('/memos');
  const q = String((await searchParams).q ?? '')
    .slice(0, 200)
    .trim();
  const visible = await listMemos(actor);
  // A customer's list holds frozen memos; their text is searched on the portal's revisions, not here.
  const memos = q ? await searchMemos(visible, q, { searchText: memoVisibility(actor).scope !== 'released' }) : visible;
  const canCreate = decideGlobal(actor, 'memo.create').allowed;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-4">
        <div>
          <h1 className="text-title font-semibold">Memos</h1>
          <p className="text-note text-ink-soft">Design memos you can see in your role.</p>
        </div>
        {canCreate && <NewMemoForm templates={listTemplates()} />}
      </div>
      {visible.length > 0 && (
        <form role="search" method="get" action="/memos" className="flex flex-wrap items-end gap-2">
          <div className="min-w-0 flex-1 sm:max-w-md">
            <label htmlFor="memo-search" className="label">
              Search memos
            </label>
            <input
              id="memo-search"
              name="q"
              type="search"
              className="field"
              defaultValue={q}
              placeholder="Number, title, owner or words in the text"
              maxLength={200}
            />
          </div>
          <button type="submit" className="btn-quiet">
            Search
          </button>
          {q && (
            <Link href="/memos" className="text-note">
              Show all
            </Link>
          )}
        </form>
      )}
      {q && memos.length === 0 ? (
        <div className="sheet px-6 py-12 text-center">
          <p className="text-body text-ink-soft">No memo you can see matches “{q}”.</p>
        </div>
      ) : memos.length === 0 ? (
        <div className="sheet px-6 py-12 text-center">
          <p className="text-body text-ink-soft">{EMPTY_TEXT[actor.role] ?? 'No memos to show.'}</p>
        </div>
      ) : (
        <MemoTable memos={memos} />
      )}
    </div>
  );
}

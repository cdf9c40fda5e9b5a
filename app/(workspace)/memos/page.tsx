import type { Metadata } from 'next';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { listMemos } from '@/lib/memos/list-memos';
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

export default async function MemosPage() {
  const actor = await requirePageActor('/memos');
  const memos = await listMemos(actor);
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
      {memos.length === 0 ? (
        <div className="sheet px-6 py-12 text-center">
          <p className="text-body text-ink-soft">{EMPTY_TEXT[actor.role] ?? 'No memos to show.'}</p>
        </div>
      ) : (
        <MemoTable memos={memos} />
      )}
    </div>
  );
}

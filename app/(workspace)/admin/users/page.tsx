import type { Metadata } from 'next';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { listUsers } from '@/lib/users/list-users';
import type { UserRecord } from '@/lib/users/user-record';
import { UserAdmin } from '@/components/admin/UserAdmin';
import { Problem } from '@/components/shell/Problem';

export const metadata: Metadata = { title: 'People' };
export const dynamic = 'force-dynamic';

export default async function UsersPage() {
  const actor = await requirePageActor('/admin/users');
  const decision = decideGlobal(actor, 'user.manage');
  if (!decision.allowed) return <Problem title="Not available to you" message={decision.reason} />;
  const users = (await listUsers(actor)) as UserRecord[];
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-title font-semibold">People</h1>
        <p className="text-note text-ink-soft">
          Accounts, roles and access. Deactivated people cannot sign in; their work stays.
        </p>
      </div>
      <UserAdmin users={users} selfId={actor.id} />
    </div>
  );
}

import Link from 'next/link';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/brand/Wordmark';
import { UserMenu } from '@/components/shell/UserMenu';
import { UnreadBadge } from '@/components/comments/UnreadBadge';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { ROLE_LABELS } from '@/lib/auth/roles';

export const dynamic = 'force-dynamic';

export default async function WorkspaceLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor('/memos');
  const canManageUsers = decideGlobal(actor, 'user.manage').allowed;
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 btn-quiet">
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper-raised">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-gutter py-3">
          <Link href="/memos" className="no-underline hover:no-underline" aria-label="Nodewright home">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="flex flex-wrap gap-x-4 gap-y-1 text-note">
            <Link href="/memos">Memos</Link>
            {canManageUsers && <Link href="/admin/users">People</Link>}
            {decideGlobal(actor, 'audit.view').allowed && <Link href="/admin/audit">Audit trail</Link>}
            {decideGlobal(actor, 'outbox.view').allowed && <Link href="/admin/outbox">Outbox</Link>}
            {decideGlobal(actor, 'organisation.manage').allowed && <Link href="/admin/organisation">Organisation</Link>}
            {decideGlobal(actor, 'portal.view').allowed && <Link href="/portal">Released to you</Link>}
          </nav>
          <div className="ml-auto flex items-center gap-2">
            {decideGlobal(actor, 'review.notes').allowed && <UnreadBadge />}
            <UserMenu name={actor.name} email={actor.email} roleLabel={ROLE_LABELS[actor.role]} />
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-gutter py-8">
        {children}
      </main>
    </div>
  );
}

import type { Metadata } from 'next';
import Link from 'next/link';
import { inspectAccountLink } from '@/lib/delivery/inspect-account-link';
import { LINK_REFUSALS } from '@/lib/delivery/spend-account-link';
import { PublicSheet } from '@/components/delivery/PublicSheet';
import { AccountLinkForm } from '@/components/delivery/AccountLinkForm';

export const metadata: Metadata = { title: 'Invitation', referrer: 'no-referrer' };
export const dynamic = 'force-dynamic';

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const token = decodeURIComponent((await params).token);
  const view = await inspectAccountLink(token, 'invitation');
  if (!view.ok) {
    return (
      <PublicSheet title="This invitation cannot be used" tone="refused">
        <p className="text-body text-ink-soft">{LINK_REFUSALS[view.reason]}</p>
        <p className="mt-4">
          <Link href="/signin" className="btn-quiet no-underline">
            Sign in
          </Link>
        </p>
      </PublicSheet>
    );
  }
  return (
    <PublicSheet title="Open your Nodewright account">
      <p className="mb-4 text-note text-ink-soft">
        For <span className="font-mono">{view.email}</span>. Design memos released to you will be waiting after this
        step.
      </p>
      <AccountLinkForm kind="invitation" token={token} defaultName={view.name} />
    </PublicSheet>
  );
}

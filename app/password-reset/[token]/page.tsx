import type { Metadata } from 'next';
import Link from 'next/link';
import { inspectAccountLink } from '@/lib/delivery/inspect-account-link';
import { LINK_REFUSALS } from '@/lib/delivery/spend-account-link';
import { PublicSheet } from '@/components/delivery/PublicSheet';
import { AccountLinkForm } from '@/components/delivery/AccountLinkForm';

export const metadata: Metadata = { title: 'New password', referrer: 'no-referrer' };
export const dynamic = 'force-dynamic';

export default async function PasswordResetTokenPage({ params }: { params: Promise<{ token: string }> }) {
  const token = decodeURIComponent((await params).token);
  const view = await inspectAccountLink(token, 'password-reset');
  if (!view.ok) {
    return (
      <PublicSheet title="This reset link cannot be used" tone="refused">
        <p className="text-body text-ink-soft">{LINK_REFUSALS[view.reason]}</p>
        <p className="mt-4">
          <Link href="/password-reset" className="btn-quiet no-underline">
            Ask for a new link
          </Link>
        </p>
      </PublicSheet>
    );
  }
  return (
    <PublicSheet title="Choose a new password">
      <p className="mb-4 text-note text-ink-soft">
        For <span className="font-mono">{view.email}</span>.
      </p>
      <AccountLinkForm kind="password-reset" token={token} />
    </PublicSheet>
  );
}

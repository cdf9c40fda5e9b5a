import type { Metadata } from 'next';
import Link from 'next/link';
import { inspectDeliveryLink, type LinkRefusal } from '@/lib/delivery/inspect-delivery-link';
import { PublicSheet } from '@/components/delivery/PublicSheet';
import { OpenDeliveryButton } from '@/components/delivery/OpenDeliveryButton';
import { formatDateTime } from '@/lib/format/format-date';
import { currentActor } from '@/lib/auth/current-actor';
import { SignOutFirstButton } from '@/components/auth/SignOutFirstButton';

export const metadata: Metadata = { title: 'Released revision', referrer: 'no-referrer' };
export const dynamic = 'force-dynamic';

const REFUSED: Record<LinkRefusal, { title: string; text: (expiredAt?: string) => string }> = {
  forged: {
    title: 'This link is not valid',
    text: () =>
      'It was not issued by this Nodewright server, or it was changed on the way. Nothing can be opened through it.',
  },
  expired: {
    title: 'This link has expired',
    text: (at) =>
      `It could be used until ${at ? formatDateTime(at) : 'its expiry date'}. Ask your configuration manager to send the revision again, or sign in to see what was released to you.`,
  },
  used: {
    title: 'This link has already been used',
    text: () => 'Each delivery link opens once. Sign in to see every revision released to you.',
  },
  replaced: {
    title: 'A newer link replaced this one',
    text: () =>
      'The revision was sent to you again, and the newer message’s link voided this one. Use the link in the most recent message, or sign in to see every revision released to you.',
  },
  inactive: {
    title: 'Your account is not active yet',
    text: () =>
      'Accept the invitation that was sent to you first (the message “Your invitation to Nodewright”), then follow this link again.',
  },
};

/**
 * Where a release message's link lands. Looking does not spend the link (mail
 * scanners fetch links too); the button does, by signing the recipient in.
 * When the browser is signed in as someone else, the page says so and offers
 * to sign out first: a link never switches a browser to another person (the
 * `delivery-link` provider refuses it as well).
 */
export default async function DeliveryLinkPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const view = await inspectDeliveryLink(decodeURIComponent(token));
  if (!view.ok) {
    const r = REFUSED[view.reason];
    return (
      <PublicSheet title={r.title} tone="refused">
        <p className="text-body text-ink-soft">{r.text(view.expiredAt)}</p>
        <p className="mt-4">
          <Link href="/signin?callbackUrl=/portal" className="btn-quiet no-underline">
            Sign in
          </Link>
        </p>
      </PublicSheet>
    );
  }
  const signedIn = await currentActor();
  if (signedIn && signedIn.id !== view.recipientId) {
    return (
      <PublicSheet title="Someone else is signed in here" tone="refused">
        <p className="mb-2 text-body">
          This link is for {view.recipientName}, but this browser is signed in as {signedIn.name} ({signedIn.email}).
        </p>
        <p className="mb-4 text-note text-ink-soft">
          Opening it here would switch the browser to another person, so it stays unopened. Sign out first, then open
          revision {view.letter}; or open the link in another browser.
        </p>
        <SignOutFirstButton name={signedIn.name} />
      </PublicSheet>
    );
  }
  return (
    <PublicSheet title={`Revision ${view.letter} released to you`}>
      <p className="font-mono text-note text-ink-soft">{view.documentNumber}</p>
      <p className="mb-4 text-body">{view.title}</p>
      <p className="mb-4 text-note text-ink-soft">
        For {view.recipientName}. This link opens the revision once and signs you in; it is valid until{' '}
        {formatDateTime(view.expiresAt)}.
      </p>
      <OpenDeliveryButton
        token={decodeURIComponent(token)}
        letter={view.letter}
        target={`/portal/${view.memoId}/${view.letter}`}
      />
    </PublicSheet>
  );
}

import type { Metadata } from 'next';
import { requirePageActor } from '@/lib/auth/current-actor';
import { decideGlobal } from '@/lib/auth/permissions';
import { NotificationSettingsForm } from '@/components/notifications/NotificationSettingsForm';

export const dynamic = 'force-dynamic';
export const metadata: Metadata = { title: 'Notification e-mail · Nodewright' };

/** The signed-in person's own notification e-mail settings. */
export default async function NotificationSettingsPage() {
  const actor = await requirePageActor('/settings/notifications');
  return (
    <div className="max-w-2xl space-y-4">
      <h1 className="text-title font-semibold">Notification e-mail</h1>
      {decideGlobal(actor, 'review.notes').allowed ? (
        <>
          <p className="text-note text-ink-soft">
            Every step of a review you take part in shows under <strong>Review notes</strong> in the header. Choose
            which of them also reach {actor.email} by e-mail; a switched-off kind still shows in the app.
          </p>
          <NotificationSettingsForm />
        </>
      ) : (
        <p className="text-note text-ink-soft">Your role receives no review notifications.</p>
      )}
    </div>
  );
}

import { withActor, parseJsonBody } from '@/lib/api/route-handler';
import { getNotificationSettings } from '@/lib/notifications/get-notification-settings';
import { updateNotificationSettings } from '@/lib/notifications/update-notification-settings';
import { notificationSettingsInputSchema } from '@/lib/notifications/notification-settings-schema';

export const dynamic = 'force-dynamic';

/** The signed-in person's own choice of which workflow notifications also come by e-mail. */
export const GET = withActor(async ({ actor }) => getNotificationSettings(actor));

/** PUT {email: {submitted?, 'changes-requested'?, approved?, frozen?, released?: boolean}} */
export const PUT = withActor(async ({ req, actor }) =>
  updateNotificationSettings(actor, await parseJsonBody(req, notificationSettingsInputSchema)),
);

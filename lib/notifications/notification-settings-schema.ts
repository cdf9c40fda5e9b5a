import { z } from 'zod';
import { WORKFLOW_NOTIFICATION_KINDS, type WorkflowNotificationKind } from './notification-kinds';

const emailFlag = (kind: string) => z.boolean({ error: `${kind} must be true or false` }).optional();

/** PUT /api/me/notification-settings: `{email: {submitted?: boolean, …}}`, only the kinds to change. */
export const notificationSettingsInputSchema = z.strictObject(
  {
    email: z.strictObject(
      Object.fromEntries(WORKFLOW_NOTIFICATION_KINDS.map((k) => [k, emailFlag(k)])) as Record<
        WorkflowNotificationKind,
        ReturnType<typeof emailFlag>
      >,
      { error: `email must map kinds (${WORKFLOW_NOTIFICATION_KINDS.join(', ')}) to true or false` },
    ),
  },
  { error: 'the body must be {email: {kind: true | false}}' },
);
export type NotificationSettingsInput = z.infer<typeof notificationSettingsInputSchema>;

/** Which kinds of workflow notification the signed-in person also gets by e-mail (all of them unless switched off). */
export interface NotificationSettingsRecord {
  email: Record<WorkflowNotificationKind, boolean>;
}

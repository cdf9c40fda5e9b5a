import { db, NotificationSetting } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { getNotificationSettings } from './get-notification-settings';
import {
  notificationSettingsInputSchema,
  type NotificationSettingsInput,
  type NotificationSettingsRecord,
} from './notification-settings-schema';
import type { WorkflowNotificationKind } from './notification-kinds';

/** Switches e-mail per kind on or off for the actor only; kinds not named keep their setting. Returns all of them. */
export async function updateNotificationSettings(
  actor: Actor,
  input: NotificationSettingsInput,
): Promise<NotificationSettingsRecord> {
  assertGlobal(actor, 'review.notes');
  const { email } = notificationSettingsInputSchema.parse(input);
  const changes = Object.entries(email).filter(
    (e): e is [WorkflowNotificationKind, boolean] => typeof e[1] === 'boolean',
  );
  const sequelize = await db();
  return sequelize.transaction(async (transaction) => {
    for (const [kind, on] of changes)
      await NotificationSetting.upsert({ userId: actor.id, kind, email: on }, { transaction });
    if (changes.length > 0)
      await recordAudit(
        { actor, action: 'user.update', details: { notificationEmail: Object.fromEntries(changes) } },
        transaction,
      );
    return getNotificationSettings(actor, transaction);
  });
}

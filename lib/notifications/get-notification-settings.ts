import type { Transaction } from 'sequelize';
import { db, NotificationSetting } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { WORKFLOW_NOTIFICATION_KINDS } from './notification-kinds';
import type { NotificationSettingsRecord } from './notification-settings-schema';

/** The actor's own e-mail choices per kind; a kind never touched is on. */
export async function getNotificationSettings(
  actor: Actor,
  transaction?: Transaction,
): Promise<NotificationSettingsRecord> {
  assertGlobal(actor, 'review.notes');
  await db();
  const rows = await NotificationSetting.findAll({ where: { userId: actor.id }, transaction });
  const chosen = new Map(rows.map((r) => [r.kind, Boolean(r.email)]));
  return {
    email: Object.fromEntries(
      WORKFLOW_NOTIFICATION_KINDS.map((k) => [k, chosen.get(k) ?? true]),
    ) as NotificationSettingsRecord['email'],
  };
}

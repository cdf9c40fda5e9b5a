import { db, User } from '@/models';
import { ApiError, notFound } from '@/lib/api/errors';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { hashPassword } from './password';
import { recordAudit } from '@/lib/audit/record-audit';
import { updateUserInputSchema, type UpdateUserInput } from './user-schema';
import { toUserRecord, type UserRecord } from './user-record';
import { endUserSessions } from '@/lib/sessions/end-sessions';

/**
 * Administrator changes to a user: name, role, active, password. A new
 * password ends the person's sessions (all but the browser making the change,
 * when administrators change their own); deactivation ends all of them, so
 * reactivating does not bring old sessions back.
 */
export async function updateUser(
  actor: Actor,
  userId: number,
  input: UpdateUserInput,
  opts: { currentSessionId?: string | null } = {},
): Promise<UserRecord> {
  assertGlobal(actor, 'user.manage');
  const parsed = updateUserInputSchema.parse(input);
  await db();
  const user = await User.findByPk(userId);
  if (!user) throw notFound(`User ${userId}`);
  if (user.id === actor.id && (parsed.active === false || (parsed.role && parsed.role !== 'admin'))) {
    throw new ApiError(
      'conflict',
      'You cannot deactivate yourself or remove your own administrator role; ask another administrator.',
    );
  }
  if (parsed.name !== undefined) user.name = parsed.name;
  if (parsed.role !== undefined) user.role = parsed.role;
  if (parsed.active !== undefined) user.active = parsed.active;
  if (parsed.password !== undefined) user.passwordHash = await hashPassword(parsed.password);
  await user.save();
  let sessionsEnded = 0;
  if (parsed.active === false) sessionsEnded += await endUserSessions(user.id, 'deactivated');
  if (parsed.password !== undefined)
    sessionsEnded += await endUserSessions(user.id, 'password-change', {
      exceptSessionId: user.id === actor.id ? opts.currentSessionId : null,
    });
  await recordAudit({
    actor,
    action: 'user.update',
    details: {
      userId: user.id,
      email: user.email,
      changed: Object.keys(parsed).filter((k) => k !== 'password'),
      passwordChanged: parsed.password !== undefined,
      sessionsEnded,
    },
  });
  return toUserRecord(user);
}

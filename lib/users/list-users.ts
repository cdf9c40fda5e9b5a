import { db, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { assertGlobal, decideGlobal } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import { toDirectoryEntry, toUserRecord, type DirectoryEntry, type UserRecord } from './user-record';

/**
 * Administrators get every user with all fields; other staff get the active
 * directory (id, name, role) they need to pick reviewers.
 */
export async function listUsers(actor: Actor, filter: { role?: Role } = {}): Promise<UserRecord[] | DirectoryEntry[]> {
  assertGlobal(actor, 'user.directory');
  await db();
  const full = decideGlobal(actor, 'user.manage').allowed;
  const where: { role?: Role; active?: boolean } = {};
  if (filter.role) where.role = filter.role;
  if (!full) where.active = true;
  const users = await User.findAll({ where, order: [['name', 'ASC']] });
  return full ? users.map(toUserRecord) : users.map(toDirectoryEntry);
}

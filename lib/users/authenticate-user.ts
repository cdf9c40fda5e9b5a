import { db, User } from '@/models';
import type { Actor } from '@/lib/auth/permissions';
import { verifyPassword } from './password';

/** Checks an e-mail and password; inactive users and wrong passwords both give null. */
export async function authenticateUser(email: string, password: string): Promise<Actor | null> {
  await db();
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  if (!user || !user.active) {
    // Spend the same time as a real comparison so the answer does not tell which e-mails exist.
    await verifyPassword(password, '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.d5Z6bTqQeHhQ4Fq1jS5bYqkq0qG6');
    return null;
  }
  if (!(await verifyPassword(password, user.passwordHash))) return null;
  return { id: user.id, role: user.role, name: user.name, email: user.email };
}

/** The current state of a signed-in user, so that deactivation and role changes apply at once. */
export async function loadActiveActor(userId: number): Promise<Actor | null> {
  await db();
  const user = await User.findByPk(userId);
  if (!user || !user.active) return null;
  return { id: user.id, role: user.role, name: user.name, email: user.email };
}

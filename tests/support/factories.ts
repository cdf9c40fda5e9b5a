import { db, User, MemoReviewer } from '@/models';
import { migrateUp } from '@/lib/db/migrate';
import { createMemo } from '@/lib/memos/create-memo';
import { hashPassword } from '@/lib/users/password';
import type { Actor } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';

let counter = 0;

/** A migrated, empty database for this test file. */
export async function freshDatabase(): Promise<void> {
  await migrateUp();
  await db();
}

/** A real user row; returns it as an Actor. */
export async function makeUser(role: Role, name = `${role} ${++counter}`): Promise<Actor> {
  const email = `${role}.${counter}.${Date.now()}@test.example`;
  const user = await User.create({ email, name, role, passwordHash: await hashPassword('correct-horse-battery') });
  return { id: user.id, role, name, email };
}

export async function makeMemo(owner: Actor, opts: { title?: string; reviewers?: Actor[] } = {}) {
  const memo = await createMemo(owner, { title: opts.title ?? `Memo ${++counter}` });
  for (const r of opts.reviewers ?? []) await MemoReviewer.create({ memoId: memo.id, userId: r.id });
  return memo;
}

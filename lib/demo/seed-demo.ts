import { Transaction } from 'sequelize';
import { db, Memo, MemoReviewer, MemoVersion, User } from '@/models';
import { hashPassword } from '@/lib/users/password';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-organisation';
import { demoMemoContent, DEMO_MEMO } from './demo-memo';

/**
 * Seeds the invented demo organisation on an empty database: one user per
 * role and one demo memo. Does nothing when any user exists, so it never
 * overwrites real data.
 */
export async function seedDemo(): Promise<{ seeded: boolean }> {
  const sequelize = await db();
  if ((await User.count()) > 0) return { seeded: false };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const users = new Map<string, User>();
    for (const u of DEMO_USERS) users.set(u.role, await User.create({ ...u, passwordHash }, { transaction }));
    const analyst = users.get('analyst')!;
    const content = demoMemoContent();
    const memo = await Memo.create({ ...DEMO_MEMO, content, ownerId: analyst.id, version: 1, status: 'draft' }, { transaction });
    await MemoVersion.create({ memoId: memo.id, versionNumber: 1, title: memo.title, content, authorId: analyst.id }, { transaction });
    await MemoReviewer.create({ memoId: memo.id, userId: users.get('reviewer')!.id }, { transaction });
  });
  return { seeded: true };
}

import { Transaction } from 'sequelize';
import { db, Memo, MemoReviewer, MemoVersion, OrganisationSetting, User } from '@/models';
import { ORGANISATION_ROW_ID } from '@/lib/organisation/get-organisation';
import { getOrThrow } from '@/lib/collections/get-or-throw';
import { hashPassword } from '@/lib/users/password';
import { DEMO_DISTRIBUTION_STATEMENT, DEMO_ORGANISATION, DEMO_PASSWORD, DEMO_USERS } from './demo-organisation';
import { demoMemoContent, DEMO_MEMO } from './demo-memo';

/**
 * Seeds the invented demo organisation on an empty database: one user per
 * role, one demo memo, and the organisation setting the PDFs print. Does nothing when any user exists, so it never
 * overwrites real data.
 */
export async function seedDemo(): Promise<{ seeded: boolean }> {
  const sequelize = await db();
  if ((await User.count()) > 0) return { seeded: false };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const users = new Map<string, User>();
    for (const u of DEMO_USERS) users.set(u.role, await User.create({ ...u, passwordHash }, { transaction }));
    await OrganisationSetting.upsert(
      {
        id: ORGANISATION_ROW_ID,
        name: DEMO_ORGANISATION,
        distributionStatement: DEMO_DISTRIBUTION_STATEMENT,
        updatedBy: null,
        updatedAt: new Date(),
      },
      { transaction },
    );
    const analyst = getOrThrow(users, 'analyst', 'demo user');
    const content = demoMemoContent();
    const memo = await Memo.create(
      { ...DEMO_MEMO, content, ownerId: analyst.id, version: 1, status: 'draft' },
      { transaction },
    );
    await MemoVersion.create(
      { memoId: memo.id, versionNumber: 1, title: memo.title, content, authorId: analyst.id },
      { transaction },
    );
    await MemoReviewer.create(
      { memoId: memo.id, userId: getOrThrow(users, 'reviewer', 'demo user').id },
      { transaction },
    );
  });
  return { seeded: true };
}

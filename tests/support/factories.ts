import { db, User, MemoReviewer, MemoCoAuthor } from '@/models';
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

export async function makeMemo(owner: Actor, opts: { title?: string; reviewers?: Actor[]; coAuthors?: Actor[] } = {}) {
  const memo = await createMemo(owner, { title: opts.title ?? `Memo ${++counter}` });
  for (const r of opts.reviewers ?? []) await MemoReviewer.create({ memoId: memo.id, userId: r.id });
  for (const c of opts.coAuthors ?? []) await MemoCoAuthor.create({ memoId: memo.id, userId: c.id, addedBy: owner.id });
  return memo;
}

/**
 * A frozen revision written directly (no engine run, no PDF rendering): the
 * memo becomes frozen and the revision carries the given PDF bytes and their
 * SHA-256. For delivery tests that need a revision, not a computed one.
 */
export async function makeFrozenRevision(
  memoId: number,
  frozenBy: Actor,
  opts: {
    letter?: string;
    pdf?: Buffer;
    changeSummary?: string;
    orbitMessages?: { opmKvn: string; opmSha256: string; oemKvn: string; oemSha256: string };
  } = {},
) {
  const { Memo, Revision } = await import('@/models');
  const crypto = await import('node:crypto');
  const memo = await Memo.findByPk(memoId, { rejectOnEmpty: true });
  const pdf = opts.pdf ?? Buffer.from(`%PDF-1.7\n% test revision ${opts.letter ?? 'A'} of memo ${memoId}\n%%EOF\n`);
  const frozenAt = new Date();
  const revision = await Revision.create({
    memoId,
    letter: opts.letter ?? 'A',
    memoVersion: memo.version,
    documentNumber: memo.documentNumber,
    title: memo.title,
    content: memo.content,
    blocks: [],
    engineVersion: 'test',
    constants: [],
    figures: [],
    approval: {
      author: { id: memo.ownerId, name: 'Author', submittedAt: null },
      reviewers: [],
      configurationManager: { id: frozenBy.id, name: frozenBy.name, frozenAt: frozenAt.toISOString() },
    },
    changeSummary: opts.changeSummary ?? `Revision ${opts.letter ?? 'A'} for delivery tests.`,
    pdfData: pdf,
    pdfSha256: crypto.createHash('sha256').update(pdf).digest('hex'),
    ...opts.orbitMessages,
    frozenBy: frozenBy.id,
    frozenAt,
  });
  await memo.update({ status: 'frozen' });
  return revision;
}

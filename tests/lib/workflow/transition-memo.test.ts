import { beforeAll, describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { ApiError } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { auditQuerySchema, listAuditEvents } from '@/lib/audit/list-audit-events';
import { transitionMemo as transitionMemoSigned } from '@/lib/workflow/transition-memo';
import type { TransitionInput } from '@/lib/workflow/transition-schema';
import { freshDatabase, makeFrozenRevision, makeMemo, makeUser } from '../../support/factories';

/*
 * The review workflow through its one public entry, transitionMemo: who may
 * move a memo from which state (Draft → In review → Approved → Frozen, back to
 * Draft on requested changes or a reopen), and what a refusal answers (403 wrong
 * role or person, 409 wrong state, 400 bad input). Freezing renders in the
 * worker pool and is covered by tests/api/workflow-api.test.ts.
 */

/** Approve, request changes and freeze are signed: the factories' password goes with them (tests/api/signatures-api.test.ts covers refusals). */
const SIGNED = new Set(['approve', 'request-changes', 'freeze']);
const transitionMemo = (who: Actor, memoId: number, input: Record<string, unknown>) =>
  transitionMemoSigned(
    who,
    memoId,
    (SIGNED.has(String(input.action)) && !('password' in input)
      ? { ...input, password: 'correct-horse-battery' }
      : input) as TransitionInput,
    { clientAddress: '127.0.0.1' },
  );

let owner: Actor,
  coAuthor: Actor,
  otherAnalyst: Actor,
  reviewer: Actor,
  secondReviewer: Actor,
  cm: Actor,
  admin: Actor,
  customer: Actor;

beforeAll(async () => {
  await freshDatabase();
  [owner, coAuthor, otherAnalyst] = [await makeUser('analyst'), await makeUser('analyst'), await makeUser('analyst')];
  [reviewer, secondReviewer] = [await makeUser('reviewer'), await makeUser('reviewer')];
  [cm, admin, customer] = [await makeUser('config-manager'), await makeUser('admin'), await makeUser('customer')];
});

async function refusedWith(p: Promise<unknown>): Promise<number> {
  const err = await p.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err, 'expected a refusal').toBeInstanceOf(ApiError);
  return (err as ApiError).status;
}

const submit = (who: Actor, memoId: number, reviewers: Actor[] = [reviewer]) =>
  transitionMemo(who, memoId, { action: 'submit', reviewerIds: reviewers.map((r) => r.id) });

describe('submit (draft → in review)', () => {
  it('is done by the owner or a co-author, assigns the reviewers and starts a round', async () => {
    const memo = await makeMemo(owner, { coAuthors: [coAuthor] });
    const { memo: moved } = await submit(coAuthor, memo.id, [reviewer, secondReviewer]);
    expect(moved.status).toBe('in-review');
    expect(moved.reviewers.map((r) => r.id).sort()).toEqual([reviewer.id, secondReviewer.id].sort());
  });

  it('is refused with 403 for an analyst who is not an author and for every other role', async () => {
    const memo = await makeMemo(owner);
    expect(await refusedWith(submit(otherAnalyst, memo.id))).toBe(403);
    for (const who of [cm, admin]) expect(await refusedWith(submit(who, memo.id))).toBe(403);
  });

  it('is refused with 409 once the memo is no longer a draft', async () => {
    const memo = await makeMemo(owner);
    await submit(owner, memo.id);
    expect(await refusedWith(submit(owner, memo.id))).toBe(409);
  });

  it('is refused with 400 naming reviewerIds when someone named is not an active reviewer, and the memo stays a draft', async () => {
    const memo = await makeMemo(owner);
    const err = await submit(owner, memo.id, [cm]).then(
      () => undefined,
      (e: unknown) => e as ApiError,
    );
    expect(err?.status).toBe(400);
    expect(err?.fields?.reviewerIds).toMatch(/not an active reviewer/);
    // Nobody was assigned: the reviewer still cannot see the memo, and its author can still submit it.
    expect(await refusedWith(transitionMemo(reviewer, memo.id, { action: 'approve' }))).toBe(404);
    expect((await submit(owner, memo.id)).memo.status).toBe('in-review');
  });
});

describe('review decisions (in review → approved or back to draft)', () => {
  it('approves only when every assigned reviewer’s latest decision in the round is an approval', async () => {
    const memo = await makeMemo(owner);
    await submit(owner, memo.id, [reviewer, secondReviewer]);
    expect((await transitionMemo(reviewer, memo.id, { action: 'approve' })).memo.status).toBe('in-review');
    expect((await transitionMemo(secondReviewer, memo.id, { action: 'approve' })).memo.status).toBe('approved');
  });

  it('sends the memo back to draft on requested changes, which need a note (refused naming the note without one)', async () => {
    const memo = await makeMemo(owner);
    await submit(owner, memo.id);
    // Bad input is a ZodError here; the route translator answers it with 400 and these field messages.
    const err = await transitionMemo(reviewer, memo.id, { action: 'request-changes', note: '  ' }).then(
      () => undefined,
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(ZodError);
    expect((err as ZodError).issues.map((i) => `${i.path.join('.')}: ${i.message}`)).toEqual([
      'note: say what should change',
    ]);
    expect(
      (
        await transitionMemo(reviewer, memo.id, {
          action: 'request-changes',
          note: 'State the drag model used for the decay estimate.',
        })
      ).memo.status,
    ).toBe('draft');
  });

  it('is refused with 403 for analysts and configuration managers, 404 for a reviewer not assigned, 409 on a draft', async () => {
    const memo = await makeMemo(owner);
    expect(await refusedWith(transitionMemo(reviewer, memo.id, { action: 'approve' }))).toBe(404);
    await submit(owner, memo.id);
    expect(await refusedWith(transitionMemo(owner, memo.id, { action: 'approve' }))).toBe(403);
    expect(await refusedWith(transitionMemo(cm, memo.id, { action: 'approve' }))).toBe(403);
    expect(await refusedWith(transitionMemo(secondReviewer, memo.id, { action: 'approve' }))).toBe(404);
    const draft = await makeMemo(owner, { reviewers: [reviewer] });
    expect(await refusedWith(transitionMemo(reviewer, draft.id, { action: 'approve' }))).toBe(409);
  });
});

describe('freeze and reopen', () => {
  it('refuses to freeze anything not approved (409) and anyone but a configuration manager (403)', async () => {
    const memo = await makeMemo(owner);
    expect(await refusedWith(transitionMemo(cm, memo.id, { action: 'freeze', changeSummary: 'First issue.' }))).toBe(
      409,
    );
    expect(await refusedWith(transitionMemo(owner, memo.id, { action: 'freeze', changeSummary: 'First issue.' }))).toBe(
      403,
    );
  });

  it('reopens a frozen memo as a draft for its authors and configuration managers only, and only when frozen', async () => {
    const memo = await makeMemo(owner, { coAuthors: [coAuthor] });
    expect(await refusedWith(transitionMemo(owner, memo.id, { action: 'reopen' }))).toBe(409);
    await makeFrozenRevision(memo.id, cm);
    expect(await refusedWith(transitionMemo(otherAnalyst, memo.id, { action: 'reopen' }))).toBe(403);
    expect(await refusedWith(transitionMemo(admin, memo.id, { action: 'reopen' }))).toBe(403);
    expect(await refusedWith(transitionMemo(customer, memo.id, { action: 'reopen' }))).toBe(404);
    expect(
      (await transitionMemo(coAuthor, memo.id, { action: 'reopen', note: 'Next issue after launch-date change.' })).memo
        .status,
    ).toBe('draft');
  });

  it('records each transition in the audit trail with the memo it moved', async () => {
    const memo = await makeMemo(owner);
    await submit(owner, memo.id);
    await transitionMemo(reviewer, memo.id, { action: 'approve', note: 'Agreed.' });
    const actions = (await listAuditEvents(admin, auditQuerySchema.parse({ memoId: memo.id }))).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['memo.submit', 'memo.approve']));
  });
});

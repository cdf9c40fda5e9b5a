import { beforeAll, describe, expect, it } from 'vitest';
import {
  assertPasswordAttemptAllowed,
  PasswordAttemptsRefused,
  recordPasswordFailure,
  recordPasswordSuccess,
} from '@/lib/throttle/password-attempts';
import { LIMITS } from '@/lib/throttle/throttle-limits';
import { freshDatabase } from '../../support/factories';

/** The password-attempt guard against the limits it documents (LIMITS, README "Throttling"). */
beforeAll(freshDatabase);

async function refusal(attempt: { account: string; clientAddress: string }): Promise<PasswordAttemptsRefused | null> {
  try {
    await assertPasswordAttemptAllowed(attempt);
    return null;
  } catch (err) {
    if (err instanceof PasswordAttemptsRefused) return err;
    throw err;
  }
}

describe('password attempts', () => {
  const perAccount = LIMITS.passwordFailuresPerAccount;

  it(`refuses an account after ${perAccount.points} wrong passwords, from any address, until the block ends, and says when`, async () => {
    const account = 'Wren.Talbot@Example.org';
    for (let i = 0; i < perAccount.points; i++) {
      expect(await refusal({ account, clientAddress: `192.0.2.${i}` })).toBeNull();
      await recordPasswordFailure({ account, clientAddress: `192.0.2.${i}` });
    }
    const before = Date.now();
    const refused = await refusal({ account: 'wren.talbot@example.org', clientAddress: '198.51.100.7' });
    expect(refused?.scope).toBe('account');
    const waitMs = refused!.retryAt.getTime() - before;
    expect(waitMs).toBeGreaterThan((perAccount.blockSeconds - 5) * 1000);
    expect(waitMs).toBeLessThanOrEqual(perAccount.blockSeconds * 1000 + 1000);
    expect(refused!.message).toMatch(
      /^Too many wrong passwords for this account\. Try again after \d\d:\d\d UTC \(in about \d+ minutes\)\.$/,
    );
    // Another account from the same addresses is not affected.
    expect(await refusal({ account: 'someone.else@example.org', clientAddress: '192.0.2.1' })).toBeNull();
  });

  it('a right password clears the account’s count of wrong ones', async () => {
    const account = 'ines.palk@example.org';
    for (let i = 0; i < perAccount.points - 1; i++)
      await recordPasswordFailure({ account, clientAddress: '203.0.113.9' });
    await recordPasswordSuccess({ account });
    for (let i = 0; i < perAccount.points - 1; i++)
      await recordPasswordFailure({ account, clientAddress: '203.0.113.9' });
    expect(await refusal({ account, clientAddress: '203.0.113.9' })).toBeNull();
  });

  it(`refuses an address after ${LIMITS.passwordFailuresPerAddress.points} wrong passwords for any accounts`, async () => {
    const clientAddress = '198.51.100.200';
    for (let i = 0; i < LIMITS.passwordFailuresPerAddress.points; i++)
      await recordPasswordFailure({ account: `guess-${i}@example.org`, clientAddress });
    const refused = await refusal({ account: 'fresh-account@example.org', clientAddress });
    expect(refused?.scope).toBe('address');
    expect(refused?.message).toMatch(/^Too many wrong passwords from your network address\. Try again after/);
  });
});

describe('delivery-link attempts', () => {
  it(`refuse an address after ${LIMITS.linkFailuresPerAddress.points} unusable links, and an account after ${LIMITS.linkFailuresPerAccount.points} refused links naming it`, async () => {
    const { assertLinkAttemptAllowed, recordLinkFailure } = await import('@/lib/throttle/link-attempts');
    const blocked = (a: { clientAddress: string; userId: number | null }) =>
      assertLinkAttemptAllowed(a).then(
        () => null,
        (e: unknown) => e as PasswordAttemptsRefused,
      );
    for (let i = 0; i < LIMITS.linkFailuresPerAddress.points; i++) {
      expect(await blocked({ clientAddress: '192.0.2.77', userId: null })).toBeNull();
      await recordLinkFailure({ clientAddress: '192.0.2.77', userId: null });
    }
    expect((await blocked({ clientAddress: '192.0.2.77', userId: null }))?.message).toMatch(
      /^Too many unusable links from your network address\. Try again after/,
    );
    for (let i = 0; i < LIMITS.linkFailuresPerAccount.points; i++)
      await recordLinkFailure({ clientAddress: `198.51.100.${i}`, userId: 41 });
    expect((await blocked({ clientAddress: '198.51.100.250', userId: 41 }))?.message).toMatch(
      /^Too many unusable links for this account\./,
    );
    expect(await blocked({ clientAddress: '198.51.100.250', userId: 42 })).toBeNull();
  });
});

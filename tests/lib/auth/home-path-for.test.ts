import { describe, expect, it } from 'vitest';
import { homePathFor } from '@/lib/auth/home-path-for';
import { ROLES } from '@/lib/auth/roles';

/** Issue 12: the customer lands on their portal after sign-in, staff on the memo list. */
describe('homePathFor', () => {
  it('sends the customer to the portal and every other role to the memo list', () => {
    const homes = Object.fromEntries(
      ROLES.map((role) => [role, homePathFor({ id: 1, role, name: 'Test', email: 't@example.org' })]),
    );
    expect(homes.customer).toBe('/portal');
    for (const role of ROLES.filter((r) => r !== 'customer')) expect(homes[role]).toBe('/memos');
  });
});

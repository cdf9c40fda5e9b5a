import type { Transaction } from 'sequelize';
import { User } from '@/models';
import { ApiError } from '@/lib/api/errors';
import { checkToken, spendToken, type TokenRefusal } from './link-token';

export const LINK_REFUSALS: Record<TokenRefusal, string> = {
  forged: 'This link is not valid. Check that it was copied whole, or ask for a new one.',
  expired: 'This link has expired. Ask for a new one.',
  used: 'This link has been used already; each link works once.',
  replaced: 'A newer link was sent after this one, which voided it. Use the link in the most recent message.',
};

/** Spends an invitation or password-reset link and returns its account; a refused link is a 409 naming why. */
export async function spendAccountLink(
  token: string,
  purpose: 'invitation' | 'password-reset',
  transaction: Transaction,
): Promise<User> {
  const check = await checkToken(token, purpose, new Date(), transaction);
  if (!check.ok) throw new ApiError('conflict', LINK_REFUSALS[check.reason], { fields: { token: check.reason } });
  const user = await User.findByPk(check.claims.userId, { transaction });
  if (!user) throw new ApiError('conflict', LINK_REFUSALS.forged, { fields: { token: 'forged' } });
  if (purpose === 'password-reset' && !user.active)
    throw new ApiError('conflict', 'This account is not active; ask an administrator.', {
      fields: { token: 'inactive account' },
    });
  if (!(await spendToken(check.row, transaction)))
    throw new ApiError('conflict', LINK_REFUSALS.used, { fields: { token: 'used' } });
  return user;
}

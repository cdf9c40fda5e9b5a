import { db, User } from '@/models';
import { checkToken, type TokenRefusal } from './link-token';

export type AccountLinkView = { ok: true; name: string; email: string } | { ok: false; reason: TokenRefusal };

/** Whom an invitation or reset link is for, without spending it. */
export async function inspectAccountLink(
  token: string,
  purpose: 'invitation' | 'password-reset',
): Promise<AccountLinkView> {
  await db();
  const check = await checkToken(token, purpose);
  if (!check.ok) return { ok: false, reason: check.reason };
  const user = await User.findByPk(check.claims.userId, { attributes: ['name', 'email'] });
  return user ? { ok: true, name: user.name, email: user.email } : { ok: false, reason: 'forged' };
}

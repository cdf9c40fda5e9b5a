import crypto from 'node:crypto';
import { Transaction } from 'sequelize';
import { AccessToken, db, User } from '@/models';
import type { TokenPurpose } from '@/models/access-token';
import { resolveAuthSecret } from '@/lib/config/auth-secret';

/**
 * One-time signed links. A token is `payload.signature`, both base64url:
 * the payload names the purpose, the recipient, the delivery and revision it
 * is bound to, its expiry and a random nonce; the signature is HMAC-SHA256
 * (RFC 2104) of the payload under a key derived from the server secret.
 * Only the token's SHA-256 is stored, with used_at, so a reused link is
 * recognised and a leaked database holds no usable link.
 */
export interface TokenClaims {
  purpose: TokenPurpose;
  userId: number;
  deliveryId: number | null;
  revisionId: number | null;
  expiresAt: Date;
}

export type TokenCheck =
  { ok: true; claims: TokenClaims; row: AccessToken } | { ok: false; reason: TokenRefusal; claims?: TokenClaims };

/** replaced: a newer link was issued for the same delivery (or, for account links, the same account) before this one was used. */
export type TokenRefusal = 'forged' | 'expired' | 'used' | 'replaced';

function signingKey(): Buffer {
  return crypto.createHmac('sha256', resolveAuthSecret()).update('nodewright/link-token/v1').digest();
}

export const hashToken = (token: string): string => crypto.createHash('sha256').update(token).digest('hex');

/** Signs a payload (exported for tests that need a correctly signed, expired token). */
export function signClaims(claims: TokenClaims, nonce = crypto.randomBytes(16).toString('base64url')): string {
  const payload = [
    claims.purpose,
    claims.userId,
    claims.deliveryId ?? 0,
    claims.revisionId ?? 0,
    Math.floor(claims.expiresAt.getTime() / 1000),
    nonce,
  ].join('.');
  const body = Buffer.from(payload).toString('base64url');
  const signature = crypto.createHmac('sha256', signingKey()).update(body).digest('base64url');
  return `${body}.${signature}`;
}

/** Reads and checks the signature; null for anything not signed by this server. */
export function readClaims(token: string): TokenClaims | null {
  const m = /^([A-Za-z0-9_-]{10,400})\.([A-Za-z0-9_-]{43})$/.exec(token);
  if (!m) return null;
  const expected = crypto.createHmac('sha256', signingKey()).update(m[1]).digest();
  const given = Buffer.from(m[2], 'base64url');
  if (given.length !== expected.length || !crypto.timingSafeEqual(given, expected)) return null;
  const parts = Buffer.from(m[1], 'base64url').toString('utf8').split('.');
  if (parts.length !== 6) return null;
  const [purpose, userId, deliveryId, revisionId, expires] = parts;
  if (purpose !== 'delivery' && purpose !== 'invitation' && purpose !== 'password-reset') return null;
  const num = (s: string) => (/^\d{1,12}$/.test(s) ? Number(s) : NaN);
  if ([userId, deliveryId, revisionId, expires].some((s) => Number.isNaN(num(s)))) return null;
  return {
    purpose,
    userId: num(userId),
    deliveryId: num(deliveryId) || null,
    revisionId: num(revisionId) || null,
    expiresAt: new Date(num(expires) * 1000),
  };
}

/**
 * Creates and stores (hashed) a new one-time token, and voids the older
 * unused ones it supersedes: of the same delivery for a delivery link, of the
 * same account and purpose for an invitation or reset link. Only the newest
 * link works. Issuing is serialised per account (the account row is locked on
 * PostgreSQL; SQLite's IMMEDIATE transaction takes the write lock at once), so
 * two concurrent requests cannot both leave a live link.
 */
export async function issueToken(
  claims: Omit<TokenClaims, 'expiresAt'>,
  ttlMs: number,
  transaction?: Transaction,
): Promise<{ token: string; expiresAt: Date }> {
  const sequelize = await db();
  const expiresAt = new Date(Math.floor((Date.now() + ttlMs) / 1000) * 1000);
  const token = signClaims({ ...claims, expiresAt });
  const issue = async (t: Transaction) => {
    await User.findByPk(claims.userId, { attributes: ['id'], lock: t.LOCK.UPDATE, transaction: t });
    const superseded =
      claims.purpose === 'delivery'
        ? { purpose: claims.purpose, deliveryId: claims.deliveryId }
        : { purpose: claims.purpose, userId: claims.userId };
    await AccessToken.update(
      { replacedAt: new Date() },
      { where: { ...superseded, usedAt: null, replacedAt: null }, transaction: t },
    );
    await AccessToken.create(
      {
        purpose: claims.purpose,
        tokenHash: hashToken(token),
        userId: claims.userId,
        deliveryId: claims.deliveryId,
        expiresAt,
        usedAt: null,
      },
      { transaction: t },
    );
  };
  if (transaction) await issue(transaction);
  else await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, issue);
  return { token, expiresAt };
}

/** Signature, purpose, expiry, then the stored row: forged, expired or used tokens are refused. */
export async function checkToken(
  token: string,
  purpose: TokenPurpose,
  now = new Date(),
  transaction?: Transaction,
): Promise<TokenCheck> {
  const claims = readClaims(token);
  if (!claims || claims.purpose !== purpose) return { ok: false, reason: 'forged' };
  if (claims.expiresAt.getTime() <= now.getTime()) return { ok: false, reason: 'expired', claims };
  await db();
  const row = await AccessToken.findOne({ where: { tokenHash: hashToken(token) }, transaction });
  if (!row || row.userId !== claims.userId || row.purpose !== purpose) return { ok: false, reason: 'forged' };
  if (row.usedAt) return { ok: false, reason: 'used', claims };
  if (row.replacedAt) return { ok: false, reason: 'replaced', claims };
  return { ok: true, claims, row };
}

/** Marks the token spent; false when another request spent it first. */
export async function spendToken(row: AccessToken, transaction?: Transaction): Promise<boolean> {
  const [n] = await AccessToken.update({ usedAt: new Date() }, { where: { id: row.id, usedAt: null }, transaction });
  return n === 1;
}

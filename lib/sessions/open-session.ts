import crypto from 'node:crypto';
import { AuthSession, db } from '@/models';

/** Records a new signed-in browser; its id goes into the session JWT as `sid`. */
export async function openSession(
  userId: number,
  via: AuthSession['via'],
  clientAddress: string | null,
): Promise<string> {
  await db();
  const id = crypto.randomBytes(24).toString('base64url');
  await AuthSession.create({
    id,
    userId,
    via,
    clientAddress: clientAddress?.slice(0, 64) ?? null,
    endedAt: null,
    endedReason: null,
  });
  return id;
}

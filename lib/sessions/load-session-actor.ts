import { QueryTypes } from 'sequelize';
import { db } from '@/models';
import { isRole } from '@/lib/auth/roles';
import type { Actor } from '@/lib/auth/permissions';
import {
  recallSessionActor,
  rememberSessionActor,
  sessionMemoryGeneration,
  sessionRecheckMs,
} from './remember-session-actors';
import { sessionChangesHeard } from './listen-session-changes';

interface OpenSessionRow {
  id: number;
  role: string;
  name: string;
  email: string;
  active: boolean | number;
}

/**
 * The person behind a session JWT, checked against the session table: null
 * when the token names no session (issued before sessions were recorded), a
 * session of someone else, or an ended one, and when the person is no longer
 * active. One lookup (the session row by its primary key joined to its user)
 * returning plain rows, not model instances, because it runs before every
 * API handler. An open session read within the last
 * `NODEWRIGHT_SESSION_RECHECK_MS` is taken from this process's memory
 * (remember-session-actors.ts), which every change to sessions or people
 * empties — on every instance, on PostgreSQL — so a sign-out or revocation
 * still takes effect at the next request.
 */
export async function loadSessionActor(sessionId: string | undefined, userId: number): Promise<Actor | null> {
  if (!sessionId || !Number.isSafeInteger(userId)) return null;
  const remembering = sessionRecheckMs() > 0 && sessionChangesHeard();
  if (remembering) {
    const known = recallSessionActor(sessionId, userId);
    if (known) return known;
  }
  const generation = sessionMemoryGeneration();
  const checkedAtMs = performance.now();
  const actor = await readSessionActor(sessionId, userId);
  if (actor && remembering) rememberSessionActor(sessionId, userId, actor, generation, checkedAtMs);
  return actor;
}

async function readSessionActor(sessionId: string, userId: number): Promise<Actor | null> {
  const sequelize = await db();
  const rows = await sequelize.query<OpenSessionRow>(
    'SELECT u.id, u.role, u.name, u.email, u.active FROM auth_sessions s JOIN users u ON u.id = s.user_id WHERE s.id = :sessionId AND s.user_id = :userId AND s.ended_at IS NULL',
    { replacements: { sessionId, userId }, type: QueryTypes.SELECT },
  );
  const row = rows[0];
  if (!row || !row.active || !isRole(row.role)) return null;
  return { id: Number(row.id), role: row.role, name: row.name, email: row.email };
}

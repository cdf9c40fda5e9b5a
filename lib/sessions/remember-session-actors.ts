import type { Actor } from '@/lib/auth/permissions';

/**
 * Open sessions this process has just checked against the database, so a
 * browser's burst of requests (autosaves, calc evaluations while typing,
 * SWR revalidations) does not read the session row once per request.
 *
 * What keeps it exact, in order of what normally happens:
 * - every change this process makes to `users` or `auth_sessions` (sign-out,
 *   new password, deactivation, role or name change; see
 *   watch-session-tables.ts) forgets every entry at once, and again when its
 *   transaction commits;
 * - on PostgreSQL every instance LISTENs for the NOTIFY that such a change
 *   sends in its own transaction (listen-session-changes.ts), so another
 *   instance forgets within milliseconds of the commit; while that listener
 *   is not connected, nothing is remembered there;
 * - entries older than `NODEWRIGHT_SESSION_RECHECK_MS` (default 2000 ms)
 *   are read again, which bounds what a change made outside the app (an
 *   operator's SQL, another process on the SQLite file) can leave unseen.
 * A lookup that was under way while entries were forgotten is not stored
 * (the generation check): it may have read the state before the change.
 * Only open sessions are remembered; a refused token is read every time.
 * Times are `performance.now()` (monotonic): setting the clock back does not
 * stretch the interval. Each request gets the same frozen Actor.
 * State lives on globalThis, since Next may load a copy of this module per
 * route.
 */
interface Remembered {
  actor: Actor;
  userId: number;
  checkedAtMs: number;
}

interface SessionActorMemory {
  entries: Map<string, Remembered>;
  /** Bumped by every forget; a lookup stores its result only if it is unchanged since the lookup began. */
  generation: number;
}

const ENTRIES_MAX = 10_000;
const holder = globalThis as unknown as { __nodewrightSessionActors?: SessionActorMemory };
const memory = (): SessionActorMemory => (holder.__nodewrightSessionActors ??= { entries: new Map(), generation: 0 });

/** `NODEWRIGHT_SESSION_RECHECK_MS`: the longest an open session is taken as open without reading it again (0: every request reads it). */
export function sessionRecheckMs(): number {
  const raw = process.env.NODEWRIGHT_SESSION_RECHECK_MS;
  if (raw === undefined || raw.trim() === '') return 2000;
  const n = Number(raw);
  return Number.isSafeInteger(n) && n >= 0 && n <= 60_000 ? n : 2000;
}

/** The generation now: pass it to rememberSessionActor with the result of a lookup begun now. */
export function sessionMemoryGeneration(): number {
  return memory().generation;
}

/** The person behind an open session, when this process checked it within the recheck interval. */
export function recallSessionActor(sessionId: string, userId: number, nowMs = performance.now()): Actor | null {
  const m = memory();
  const hit = m.entries.get(sessionId);
  if (!hit || hit.userId !== userId) return null;
  if (nowMs - hit.checkedAtMs >= sessionRecheckMs()) {
    m.entries.delete(sessionId);
    return null;
  }
  return hit.actor;
}

/**
 * Remembers an open session's person, read from the database by a lookup
 * that began at `generation` and at `checkedAtMs`; dropped when anything was
 * forgotten since. Bounded: the oldest entry goes first.
 */
export function rememberSessionActor(
  sessionId: string,
  userId: number,
  actor: Actor,
  generation: number,
  checkedAtMs: number,
): void {
  const m = memory();
  if (generation !== m.generation || sessionRecheckMs() === 0) return;
  if (m.entries.size >= ENTRIES_MAX && !m.entries.has(sessionId)) {
    const oldest = m.entries.keys().next();
    if (!oldest.done) m.entries.delete(oldest.value);
  }
  m.entries.delete(sessionId);
  m.entries.set(sessionId, { actor: Object.freeze({ ...actor }), userId, checkedAtMs });
}

/** Forgets every remembered session: something about sessions or people changed. */
export function forgetSessionActors(): void {
  const m = memory();
  m.generation += 1;
  m.entries.clear();
}

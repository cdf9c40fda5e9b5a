/**
 * lib/sessions/load-session-actor.ts with the process's memory of open
 * sessions (remember-session-actors.ts). What is checked, on the test
 * database (SQLite file, or PostgreSQL under `npm run test:postgres`):
 *  - a session checked once is not read again within the recheck interval
 *    (counted: queries on the session table);
 *  - every way the app ends a session or changes a person — sign-out, new
 *    password, deactivation, role change, the end of sessions inside a
 *    transaction — is seen at the very next lookup, with no wait;
 *  - a change made outside the app's models (plain SQL, as an operator
 *    would) is seen once the recheck interval has passed;
 *  - on PostgreSQL, a NOTIFY sent by another connection (what another
 *    instance's change sends, PostgreSQL documentation: NOTIFY) makes this
 *    process forget at once, well within the interval.
 */
import pg from 'pg';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { db, User } from '@/models';
import { getSequelize } from '@/lib/db/connection';
import { loadSessionActor } from '@/lib/sessions/load-session-actor';
import { openSession } from '@/lib/sessions/open-session';
import { endSession, endUserSessions } from '@/lib/sessions/end-sessions';
import { updateUser } from '@/lib/users/update-user';
import {
  sessionChangesHeard,
  SESSION_CHANGE_CHANNEL,
  SESSION_LISTENER_NAME,
} from '@/lib/sessions/listen-session-changes';
import type { Actor } from '@/lib/auth/permissions';
import { freshDatabase, makeUser } from '../../support/factories';

const postgres = (process.env.DATABASE_URL ?? '').startsWith('postgres');
const RECHECK_MS = 1500;
let sessionReads = 0;
let admin: Actor;

const until = async (what: string, done: () => boolean, ms = 5000) => {
  const end = Date.now() + ms;
  while (!done()) {
    if (Date.now() > end) throw new Error(`${what}: not within ${ms} ms`);
    await new Promise((ok) => setTimeout(ok, 10));
  }
};

beforeAll(async () => {
  process.env.NODEWRIGHT_SESSION_RECHECK_MS = String(RECHECK_MS);
  await freshDatabase();
  admin = await makeUser('admin');
  // Count the statements that read the session table (the lookup's SQL names it).
  const sequelize = getSequelize();
  const query = sequelize.query.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  (sequelize as unknown as { query: typeof query }).query = (...args: unknown[]) => {
    if (typeof args[0] === 'string' && args[0].includes('FROM auth_sessions s JOIN users')) sessionReads += 1;
    return query(...args);
  };
  if (postgres) await until('the LISTEN connection', () => sessionChangesHeard());
});

afterAll(() => {
  delete process.env.NODEWRIGHT_SESSION_RECHECK_MS;
});

beforeEach(() => {
  sessionReads = 0;
});

async function signedInAnalyst() {
  const person = await makeUser('analyst');
  const sessionId = await openSession(person.id, 'password', '127.0.0.1');
  expect(await loadSessionActor(sessionId, person.id)).toMatchObject({ id: person.id, role: 'analyst' });
  return { person, sessionId };
}

describe('loadSessionActor', () => {
  it('reads an open session once within the recheck interval, and again after it', async () => {
    const { person, sessionId } = await signedInAnalyst();
    for (let i = 0; i < 20; i++) expect((await loadSessionActor(sessionId, person.id))?.id).toBe(person.id);
    expect(sessionReads).toBe(1);
    await new Promise((ok) => setTimeout(ok, RECHECK_MS + 100));
    await loadSessionActor(sessionId, person.id);
    expect(sessionReads).toBe(2);
  });

  it('does not take a remembered session for another person (the token must name the session’s owner)', async () => {
    const { sessionId } = await signedInAnalyst();
    const other = await makeUser('analyst');
    expect(await loadSessionActor(sessionId, other.id)).toBeNull();
  });

  it('sees a sign-out at the next lookup', async () => {
    const { person, sessionId } = await signedInAnalyst();
    expect(await endSession(sessionId, 'sign-out')).toBe(true);
    expect(await loadSessionActor(sessionId, person.id)).toBeNull();
  });

  it('sees a new password, a deactivation and a role change at the next lookup', async () => {
    const a = await signedInAnalyst();
    await updateUser(admin, a.person.id, { password: 'another-long-passphrase-7' });
    expect(await loadSessionActor(a.sessionId, a.person.id)).toBeNull();

    const b = await signedInAnalyst();
    await updateUser(admin, b.person.id, { active: false });
    expect(await loadSessionActor(b.sessionId, b.person.id)).toBeNull();

    const c = await signedInAnalyst();
    await updateUser(admin, c.person.id, { role: 'reviewer', name: 'Renamed Person' });
    expect(await loadSessionActor(c.sessionId, c.person.id)).toMatchObject({
      role: 'reviewer',
      name: 'Renamed Person',
    });
  });

  it('sees sessions ended inside a transaction once it commits, even when looked up while it ran', async () => {
    const { person, sessionId } = await signedInAnalyst();
    const sequelize = await db();
    let lookedUpDuring: Actor | null | undefined;
    await sequelize.transaction(async (transaction) => {
      await endUserSessions(person.id, 'password-reset', { transaction });
      // Another request during the transaction reads the last committed state: still open.
      lookedUpDuring = await loadSessionActor(sessionId, person.id);
    });
    expect(lookedUpDuring?.id).toBe(person.id);
    expect(await loadSessionActor(sessionId, person.id)).toBeNull();
  });

  it('sees a change made outside the models (plain SQL) once the recheck interval has passed', async () => {
    const { person, sessionId } = await signedInAnalyst();
    await getSequelize().query('UPDATE auth_sessions SET ended_at = :now WHERE id = :sessionId', {
      replacements: { now: new Date(), sessionId },
      type: QueryTypes.UPDATE,
    });
    // Within the interval it may still be taken as open (that is the bound, not a promise of staleness).
    await new Promise((ok) => setTimeout(ok, RECHECK_MS + 100));
    expect(await loadSessionActor(sessionId, person.id)).toBeNull();
    expect(await User.count({ where: { id: person.id } })).toBe(1);
  });

  it.skipIf(!postgres)('on PostgreSQL: forgets at once when another instance announces a change', async () => {
    const { person, sessionId } = await signedInAnalyst();
    // End the session behind this process's back, as another instance would, then announce it as that instance does.
    const other = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await other.connect();
    try {
      await other.query('BEGIN');
      await other.query('UPDATE auth_sessions SET ended_at = now() WHERE id = $1', [sessionId]);
      await other.query(`NOTIFY ${SESSION_CHANGE_CHANNEL}`);
      await other.query('COMMIT');
    } finally {
      await other.end();
    }
    const announcedAt = Date.now();
    let actor: Actor | null = person;
    while (actor && Date.now() - announcedAt < RECHECK_MS / 3) {
      actor = await loadSessionActor(sessionId, person.id);
      if (actor) await new Promise((ok) => setTimeout(ok, 5));
    }
    expect(actor, `still taken as open ${Date.now() - announcedAt} ms after the NOTIFY`).toBeNull();
  });

  it.skipIf(!postgres)(
    'on PostgreSQL: remembers nothing while its LISTEN connection is gone, and listens again',
    async () => {
      const { person, sessionId } = await signedInAnalyst();
      const admin = new pg.Client({ connectionString: process.env.DATABASE_URL });
      await admin.connect();
      try {
        const killed = await admin.query(
          'SELECT pg_terminate_backend(pid) AS done FROM pg_stat_activity WHERE application_name = $1',
          [SESSION_LISTENER_NAME],
        );
        expect(killed.rows.map((r) => r.done)).toEqual([true]);
      } finally {
        await admin.end();
      }
      await until('the listener noticing it is gone', () => !sessionChangesHeard());
      sessionReads = 0;
      for (let i = 0; i < 3; i++) await loadSessionActor(sessionId, person.id);
      expect(sessionReads, 'reads while the listener is down').toBe(3);
      await until('the listener back', () => sessionChangesHeard());
      sessionReads = 0;
      for (let i = 0; i < 3; i++) await loadSessionActor(sessionId, person.id);
      expect(sessionReads, 'reads once it listens again').toBe(1);
    },
  );
});

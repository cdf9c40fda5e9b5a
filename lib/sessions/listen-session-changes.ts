import pg from 'pg';
import type { Sequelize, Transaction } from 'sequelize';
import { forgetSessionActors } from './remember-session-actors';
import { parseDatabaseUrl, whenDatabaseCloses } from '@/lib/db/connection';

/**
 * PostgreSQL only: how instances behind one database tell each other that a
 * session or a person changed, so each forgets the sessions it remembers
 * (remember-session-actors.ts). The change sends `NOTIFY` in its own
 * transaction, which PostgreSQL delivers to every listening connection when
 * that transaction commits, and not at all when it rolls back (PostgreSQL
 * documentation, SQL command NOTIFY). Each instance keeps one connection of its
 * own that LISTENs; while it is down, `sessionChangesHeard` is false and the
 * instance remembers nothing. A connection that dies without a word (a
 * firewall dropping it) is found by TCP keep-alive and by a `SELECT 1` every
 * second that must answer within a second. Notifications need a real
 * PostgreSQL session: point DATABASE_URL at the server or at a pooler in
 * session mode, not in transaction mode. On SQLite the app is one process and
 * its own model hooks see every change: nothing to listen to.
 */
export const SESSION_CHANGE_CHANNEL = 'nodewright_session_change';
/** The LISTEN connection's application_name, as pg_stat_activity shows it. */
export const SESSION_LISTENER_NAME = 'nodewright-session-listener';
const RECONNECT_MS = 1000;
/** How often the LISTEN connection is asked `SELECT 1`, and how long it may take to answer, before it counts as lost. */
const HEARTBEAT_MS = 1000;

interface Listener {
  url: string;
  client?: pg.Client;
  live: boolean;
  starting: boolean;
  closed: boolean;
  heartbeat?: NodeJS.Timeout;
  /** performance.now() before which a lost connection is not tried again. */
  retryAtMs: number;
}
const holder = globalThis as unknown as { __nodewrightSessionListener?: Listener };

function postgresUrl(): string | null {
  const target = parseDatabaseUrl();
  return target.dialect === 'postgres' ? target.url : null;
}

/**
 * Whether this process hears every change to sessions and people, so that
 * remembering open sessions is safe: always on SQLite; on PostgreSQL once
 * the LISTEN connection is up (the first call starts it, and a lost one is
 * reconnected after a second).
 */
export function sessionChangesHeard(): boolean {
  const url = postgresUrl();
  if (!url) return true;
  let listener = holder.__nodewrightSessionListener;
  if (!listener || listener.url !== url) {
    if (listener) void stopListener(listener);
    listener = holder.__nodewrightSessionListener = { url, live: false, starting: false, closed: false, retryAtMs: 0 };
    whenDatabaseCloses(stopListeningForSessionChanges);
  }
  if (!listener.live && !listener.starting && !listener.closed && performance.now() >= listener.retryAtMs)
    void startListener(listener);
  return listener.live;
}

async function startListener(listener: Listener): Promise<void> {
  listener.starting = true;
  const client = new pg.Client({
    connectionString: listener.url,
    keepAlive: true,
    application_name: SESSION_LISTENER_NAME,
  });
  listener.client = client;
  let down = false;
  const lost = () => {
    if (down) return;
    down = true;
    clearInterval(listener.heartbeat);
    listener.live = false;
    listener.starting = false;
    listener.retryAtMs = performance.now() + RECONNECT_MS;
    forgetSessionActors();
    client.end().catch(() => undefined);
    // Only the listener still in charge reconnects: one stopped with the database stays stopped.
    if (!listener.closed)
      setTimeout(() => {
        if (holder.__nodewrightSessionListener === listener && !listener.closed) sessionChangesHeard();
      }, RECONNECT_MS).unref();
  };
  client.on('error', lost);
  client.on('end', lost);
  client.on('notification', (message) => {
    if (message.channel === SESSION_CHANGE_CHANNEL) forgetSessionActors();
  });
  try {
    await client.connect();
    await client.query(`LISTEN ${SESSION_CHANGE_CHANNEL}`);
  } catch {
    lost();
    return;
  }
  if (down || listener.closed) return;
  // Lookups begun before LISTEN took effect may have read a state it would have announced: not stored.
  forgetSessionActors();
  listener.live = true;
  listener.starting = false;
  let asking = false;
  listener.heartbeat = setInterval(() => {
    if (asking || down) return;
    asking = true;
    const late = setTimeout(lost, HEARTBEAT_MS);
    client.query('SELECT 1').then(
      () => {
        clearTimeout(late);
        asking = false;
      },
      () => {
        clearTimeout(late);
        lost();
      },
    );
  }, HEARTBEAT_MS);
  listener.heartbeat.unref();
}

async function stopListener(listener: Listener): Promise<void> {
  listener.closed = true;
  listener.live = false;
  clearInterval(listener.heartbeat);
  await listener.client?.end().catch(() => undefined);
}

/** Closes this process's LISTEN connection (with the database, at shutdown and between tests). */
export async function stopListeningForSessionChanges(): Promise<void> {
  const listener = holder.__nodewrightSessionListener;
  holder.__nodewrightSessionListener = undefined;
  forgetSessionActors();
  if (listener) await stopListener(listener);
}

/**
 * Tells every instance that sessions or people changed: on PostgreSQL a
 * NOTIFY in `transaction` (sent when it commits) or on its own; nothing on
 * SQLite.
 */
export async function announceSessionChange(sequelize: Sequelize, transaction?: Transaction | null): Promise<void> {
  if (sequelize.getDialect() !== 'postgres') return;
  if (transaction) {
    // Part of the change: if it cannot be sent, the change is rolled back with it.
    await sequelize.query(`NOTIFY ${SESSION_CHANGE_CHANNEL}`, { transaction });
    return;
  }
  // The change is already committed: a failed NOTIFY must not turn it into an error for the caller
  // (a deactivation would then skip ending the sessions). The other instances read the session
  // again within NODEWRIGHT_SESSION_RECHECK_MS anyway.
  try {
    await sequelize.query(`NOTIFY ${SESSION_CHANGE_CHANNEL}`);
  } catch (err) {
    console.error('[nodewright] could not announce a session change to other instances:', (err as Error).message);
  }
}

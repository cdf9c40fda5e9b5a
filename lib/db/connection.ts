import path from 'node:path';
import fs from 'node:fs';
import { Sequelize, Transaction } from 'sequelize';
import { serialiseWrites } from './serialise-writes';
import { spreadSqliteReads, sqliteReadConnections } from './spread-sqlite-reads';

const DEFAULT_DATABASE_URL = 'sqlite:data/nodewright.sqlite';

export interface DatabaseTarget {
  dialect: 'sqlite' | 'postgres';
  /** For SQLite: absolute file path or ':memory:'. */
  storage?: string;
  url: string;
}

/**
 * Reads DATABASE_URL. `sqlite:relative/or/absolute/path.sqlite`, `sqlite::memory:`
 * and `postgres://…` are understood; anything else is refused with a message.
 */
export function parseDatabaseUrl(url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL): DatabaseTarget {
  if (url.startsWith('sqlite:')) {
    let rest = url.slice('sqlite:'.length);
    if (rest.startsWith('//')) rest = rest.slice(2);
    if (rest === ':memory:' || rest === '') return { dialect: 'sqlite', storage: ':memory:', url };
    const storage = path.resolve(/*turbopackIgnore: true*/ process.cwd(), rest);
    return { dialect: 'sqlite', storage, url };
  }
  if (url.startsWith('postgres://') || url.startsWith('postgresql://')) {
    return { dialect: 'postgres', url };
  }
  throw new Error(`DATABASE_URL must start with sqlite: or postgres:// (got "${url}")`);
}

function createSequelize(target: DatabaseTarget): Sequelize {
  if (target.dialect === 'sqlite') {
    if (target.storage && target.storage !== ':memory:') {
      fs.mkdirSync(path.dirname(target.storage), { recursive: true });
    }
    // IMMEDIATE: a transaction takes the write lock at BEGIN, so one that reads
    // and then writes cannot fail half-way against another process's writer.
    const sequelize = new Sequelize({
      dialect: 'sqlite',
      storage: target.storage,
      logging: false,
      transactionType: Transaction.TYPES.IMMEDIATE,
    });
    applyBusyTimeoutToEveryConnection(sequelize);
    spreadSqliteReads(sequelize, sqliteReadConnections());
    serialiseWrites(sequelize);
    return sequelize;
  }
  // PostgreSQL: row locks and MVCC let writers of this and other instances
  // run side by side; no write queue. Each instance keeps its own pool.
  return new Sequelize(target.url, {
    dialect: 'postgres',
    logging: false,
    pool: { max: poolMax(), min: 0, idle: 10_000, acquire: 30_000 },
  });
}

/** `NODEWRIGHT_DB_POOL_MAX` (default 10): connections one instance may hold open to PostgreSQL. */
function poolMax(): number {
  const n = Number(process.env.NODEWRIGHT_DB_POOL_MAX ?? 10);
  return Number.isSafeInteger(n) && n >= 1 ? n : 10;
}

type SqliteConnection = { configure(option: 'busyTimeout', ms: number): void };
type SqliteConnectionManager = { getConnection(options?: object): Promise<SqliteConnection> };

/**
 * Sequelize's SQLite dialect opens a separate connection per transaction and
 * runs no connect hooks, so PRAGMA busy_timeout set once would not reach them.
 * Configure the timeout on every connection it hands out (foreign keys are
 * already switched on per connection by the dialect). Writers of this process
 * never wait on it (serialiseWrites queues them); it covers another process
 * writing to the same file, such as `npm run user:add` beside the server.
 */
function applyBusyTimeoutToEveryConnection(sequelize: Sequelize): void {
  const manager = (sequelize as unknown as { connectionManager: SqliteConnectionManager }).connectionManager;
  const original = manager.getConnection.bind(manager);
  manager.getConnection = async (options?: object) => {
    const connection = await original(options);
    connection.configure('busyTimeout', 5000);
    return connection;
  };
}

type Holder = { sequelize?: Sequelize; ready?: Promise<Sequelize>; url?: string };
const holder = globalThis as unknown as { __nodewrightDb?: Holder };

/**
 * The one Sequelize instance for this process, shared on globalThis because
 * Next may load a separate copy of this module per route.
 */
export function getSequelize(): Sequelize {
  const h = (holder.__nodewrightDb ??= {});
  const url = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL;
  if (!h.sequelize || h.url !== url) {
    h.sequelize = createSequelize(parseDatabaseUrl(url));
    h.url = url;
    h.ready = undefined;
  }
  return h.sequelize;
}

/** Connects once and applies the SQLite PRAGMAs (WAL, busy timeout, foreign keys). */
export async function connectDatabase(): Promise<Sequelize> {
  const sequelize = getSequelize();
  // getSequelize() has just created the holder.
  const h = (holder.__nodewrightDb ??= {});
  h.ready ??= prepareConnection(sequelize);
  return h.ready;
}

async function prepareConnection(sequelize: Sequelize): Promise<Sequelize> {
  await sequelize.authenticate();
  if (sequelize.getDialect() === 'sqlite') {
    const storage = (sequelize as unknown as { options: { storage?: string } }).options.storage;
    if (storage !== ':memory:') await sequelize.query('PRAGMA journal_mode=WAL;');
    await sequelize.query('PRAGMA busy_timeout=5000;');
    await sequelize.query('PRAGMA foreign_keys=ON;');
  }
  return sequelize;
}

/**
 * A Sequelize instance of its own for another database than the app's (the
 * source and target of `npm run db:copy`), set up as the app's would be;
 * the caller closes it. Not for app code: there, every write of a SQLite
 * file must go through the one shared instance (see DEVELOPERS.md).
 */
export async function openOtherDatabase(url: string): Promise<Sequelize> {
  return prepareConnection(createSequelize(parseDatabaseUrl(url)));
}

type Closer = () => Promise<void> | void;
const closers = globalThis as unknown as { __nodewrightDbClosers?: Set<Closer> };

/** Runs `close` when the app's database is closed (connections of its own that a module keeps beside the pool). */
export function whenDatabaseCloses(close: Closer): void {
  (closers.__nodewrightDbClosers ??= new Set()).add(close);
}

export async function closeDatabase(): Promise<void> {
  await Promise.all([...(closers.__nodewrightDbClosers ?? [])].map((close) => close()));
  const h = holder.__nodewrightDb;
  if (h?.sequelize) {
    await h.sequelize.close();
    holder.__nodewrightDb = {};
  }
}

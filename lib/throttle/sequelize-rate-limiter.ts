import { Op, Transaction, UniqueConstraintError } from 'sequelize';
import { RateLimiterRes, type IRateLimiterOptions } from 'rate-limiter-flexible';
import RateLimiterStoreAbstract from 'rate-limiter-flexible/lib/RateLimiterStoreAbstract';
import { db, RateLimitCounter } from '@/models';

type StoredCounter = { points: number; expiresAtMs: number | null };

/**
 * This process's counter transactions run one at a time. On SQLite each
 * transaction gets its own connection whose busy wait occupies one of Node's
 * four threadpool threads; a burst of simultaneous transactions can take all
 * four while the one holding the lock waits for a thread (stack notes, "Found
 * under load"). Other processes are kept out by the database lock itself.
 * The queue lives on globalThis: Next may load one copy of this module per route.
 */
const holder = globalThis as unknown as { __nodewrightCounterQueue?: Promise<unknown> };
function oneAtATime<T>(work: () => Promise<T>): Promise<T> {
  const run = (holder.__nodewrightCounterQueue ?? Promise.resolve()).then(work, work);
  holder.__nodewrightCounterQueue = run.catch(() => undefined);
  return run;
}

/** 1 in this many new counters also clears expired counters, so the table stays small without a timer. */
const SWEEP_ONE_IN = 50;

/**
 * rate-limiter-flexible's store interface (`RateLimiterStoreAbstract`:
 * `_upsert`, `_get`, `_delete`, `_getRateLimiterRes`) over the Sequelize model
 * `RateLimitCounter`, so limits live in the app's own database and hold across
 * app instances. The package ships SQLite and PostgreSQL stores, but the
 * SQLite one wants its own sqlite3/better-sqlite3/knex handle and the
 * Sequelize option exists only for PostgreSQL; this one is dialect-neutral.
 *
 * Atomicity: each count is read and written in one short transaction that
 * holds the counter's row (SELECT … FOR UPDATE on PostgreSQL; SQLite's
 * IMMEDIATE transaction takes the write lock at once), so simultaneous
 * requests are counted one after another and each sees its own total. Two
 * requests creating the same new key on PostgreSQL: the loser's INSERT fails
 * on the primary key and it counts again against the winner's row.
 */
export class SequelizeRateLimiter extends RateLimiterStoreAbstract {
  constructor(opts: IRateLimiterOptions) {
    // The store client is the shared Sequelize instance, reached through the model.
    super({ ...opts, storeClient: RateLimitCounter });
  }

  async _upsert(rlKey: string, points: number, msDuration: number, forceExpire = false): Promise<StoredCounter> {
    await db();
    if (!Number.isInteger(points)) throw new Error(`rate limiter points must be whole numbers (got ${points})`);
    const now = Date.now();
    const expiresAtMs = msDuration > 0 ? now + msDuration : null;
    if (forceExpire) {
      await RateLimitCounter.upsert({ key: rlKey, points, expiresAtMs });
      return { points, expiresAtMs };
    }
    const sequelize = RateLimitCounter.sequelize;
    if (!sequelize) throw new Error('RateLimitCounter is not initialised with a Sequelize instance');
    for (let attempt = 0; attempt < 5; attempt++) {
      try {
        return await oneAtATime(() =>
          sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
            const row = await RateLimitCounter.findByPk(rlKey, { lock: transaction.LOCK.UPDATE, transaction });
            if (!row) {
              await RateLimitCounter.create({ key: rlKey, points, expiresAtMs }, { transaction });
              if (Math.floor(Math.random() * SWEEP_ONE_IN) === 0)
                await RateLimitCounter.destroy({ where: { expiresAtMs: { [Op.lte]: now } }, transaction });
              return { points, expiresAtMs };
            }
            const stored = toStored(row);
            const next =
              stored.expiresAtMs !== null && stored.expiresAtMs <= now
                ? { points, expiresAtMs }
                : { points: stored.points + points, expiresAtMs: stored.expiresAtMs };
            await row.update(next, { transaction });
            return next;
          }),
        );
      } catch (err) {
        // PostgreSQL: another request inserted the same new key first; count again against its row.
        if (!(err instanceof UniqueConstraintError)) throw err;
      }
    }
    throw new Error(`rate limiter counter ${rlKey} kept changing under this request; try again`);
  }

  async _get(rlKey: string): Promise<StoredCounter | null> {
    await db();
    const row = await RateLimitCounter.findByPk(rlKey);
    if (!row) return null;
    const stored = toStored(row);
    return stored.expiresAtMs !== null && stored.expiresAtMs <= Date.now() ? null : stored;
  }

  async _delete(rlKey: string): Promise<boolean> {
    await db();
    return (await RateLimitCounter.destroy({ where: { key: rlKey } })) > 0;
  }

  _getRateLimiterRes(_rlKey: string, changedPoints: number, stored: StoredCounter): RateLimiterRes {
    const isFirstInDuration = changedPoints === stored.points;
    const consumedPoints = stored.points;
    const msBeforeNext = stored.expiresAtMs === null ? -1 : Math.max(stored.expiresAtMs - Date.now(), 0);
    return new RateLimiterRes(
      Math.max(this.points - consumedPoints, 0),
      msBeforeNext,
      consumedPoints,
      isFirstInDuration,
    );
  }
}

function toStored(row: RateLimitCounter): StoredCounter {
  return { points: Number(row.points), expiresAtMs: row.expiresAtMs === null ? null : Number(row.expiresAtMs) };
}

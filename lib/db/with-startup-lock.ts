import type { Sequelize } from 'sequelize';

/** Arbitrary fixed key of the advisory lock that start-up work holds (any bigint names one lock per database). */
const STARTUP_LOCK_KEY = 7_326_001;

/**
 * Runs start-up work (migrations, seeding an empty database) as the only
 * app instance doing so. Several instances started together against one
 * PostgreSQL database would otherwise each apply the same migration or each
 * seed the demo organisation. On PostgreSQL a transaction-level advisory lock
 * (PostgreSQL 15 documentation, 9.27.10 "Advisory Lock Functions",
 * pg_advisory_xact_lock) is held on one pooled connection while the work
 * runs on others; the next instance waits, then finds nothing left to do.
 * A crashed holder's lock ends with its connection. SQLite serves one
 * machine: the work runs as it is.
 */
export async function withStartupLock<T>(sequelize: Sequelize, work: () => Promise<T>): Promise<T> {
  if (sequelize.getDialect() !== 'postgres') return work();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query(`SELECT pg_advisory_xact_lock(${STARTUP_LOCK_KEY})`, { transaction });
    return work();
  });
}

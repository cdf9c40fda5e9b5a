import { describe, expect, it } from 'vitest';
import { openOtherDatabase } from '@/lib/db/connection';
import { withStartupLock } from '@/lib/db/with-startup-lock';

/*
 * What is checked: on PostgreSQL, start-up work of two app instances
 * (two Sequelize instances with their own pools, as two processes have)
 * never overlaps: the second waits for the first's advisory lock
 * (PostgreSQL 15 documentation, 9.27.10, pg_advisory_xact_lock). The
 * work records when it starts and ends; the intervals must not intersect.
 * Runs under `npm run test:postgres`.
 */

describe.skipIf(!process.env.NODEWRIGHT_TEST_POSTGRES_URL)('withStartupLock (PostgreSQL)', () => {
  it('runs the start-up work of two instances one after the other', async () => {
    const instances = await Promise.all([
      openOtherDatabase(process.env.DATABASE_URL!),
      openOtherDatabase(process.env.DATABASE_URL!),
    ]);
    const log: string[] = [];
    const work = (name: string) => async () => {
      log.push(`${name} starts`);
      await new Promise((ok) => setTimeout(ok, 300));
      log.push(`${name} ends`);
      return name;
    };
    try {
      const done = await Promise.all(instances.map((db, i) => withStartupLock(db, work(`instance ${i + 1}`))));
      expect(done).toEqual(['instance 1', 'instance 2']);
      expect(log).toHaveLength(4);
      // Each start is followed directly by the same instance's end.
      expect(log[1]).toBe(log[0].replace('starts', 'ends'));
      expect(log[3]).toBe(log[2].replace('starts', 'ends'));
    } finally {
      await Promise.all(instances.map((db) => db.close()));
    }
  });
});

import { beforeAll, describe, expect, it } from 'vitest';
import { RateLimiterRes } from 'rate-limiter-flexible';
import { SequelizeRateLimiter } from '@/lib/throttle/sequelize-rate-limiter';
import { RateLimitCounter } from '@/models';
import { freshDatabase } from '../../support/factories';

/**
 * The database store against rate-limiter-flexible's documented contract
 * (README of rate-limiter-flexible 11: consume resolves while points remain and
 * rejects with a RateLimiterRes once they are used up; block() refuses the key
 * for its duration; delete() forgets it), with two limiter instances standing
 * for two app processes sharing one database.
 */
beforeAll(freshDatabase);

const limiter = (points: number, duration: number, keyPrefix = 'test') =>
  new SequelizeRateLimiter({ keyPrefix, points, duration });

async function outcome(p: Promise<RateLimiterRes>): Promise<'allowed' | 'refused'> {
  try {
    await p;
    return 'allowed';
  } catch (err) {
    if (err instanceof RateLimiterRes) return 'refused';
    throw err;
  }
}

describe('SequelizeRateLimiter', () => {
  it('allows `points` consumptions per window and refuses the next, counting in the database shared by two instances', async () => {
    const a = limiter(5, 60, 'shared');
    const b = limiter(5, 60, 'shared');
    const results = [];
    for (let i = 0; i < 7; i++) results.push(await outcome((i % 2 === 0 ? a : b).consume('alice')));
    expect(results).toEqual(['allowed', 'allowed', 'allowed', 'allowed', 'allowed', 'refused', 'refused']);
    const row = await RateLimitCounter.findByPk('shared:alice');
    expect(Number(row?.points)).toBe(7);
    // Another key is counted separately.
    expect(await outcome(a.consume('bob'))).toBe('allowed');
  });

  it('lets exactly `points` of 40 simultaneous consumptions through (no lost updates)', async () => {
    const l = limiter(10, 60, 'burst');
    const results = await Promise.all(Array.from({ length: 40 }, () => outcome(l.consume('same-key'))));
    expect(results.filter((r) => r === 'allowed')).toHaveLength(10);
  });

  it('starts a new window once the old one has expired', async () => {
    const l = limiter(1, 1, 'window');
    expect(await outcome(l.consume('k'))).toBe('allowed');
    expect(await outcome(l.consume('k'))).toBe('refused');
    await new Promise((r) => setTimeout(r, 1100));
    expect(await outcome(l.consume('k'))).toBe('allowed');
  });

  it('get reports consumed points and time left; block refuses for its duration; delete forgets the key', async () => {
    const l = limiter(3, 600, 'ops');
    await l.consume('k', 2);
    const res = await l.get('k');
    expect(res?.consumedPoints).toBe(2);
    expect(res?.remainingPoints).toBe(1);
    expect(res!.msBeforeNext).toBeGreaterThan(595_000);
    expect(res!.msBeforeNext).toBeLessThanOrEqual(600_000);
    await l.block('k', 30);
    const blocked = await l.get('k');
    expect(blocked?.consumedPoints).toBe(4);
    expect(blocked!.msBeforeNext).toBeGreaterThan(25_000);
    expect(blocked!.msBeforeNext).toBeLessThanOrEqual(30_000);
    expect(await outcome(l.consume('k'))).toBe('refused');
    expect(await l.delete('k')).toBe(true);
    expect(await l.get('k')).toBeNull();
    expect(await outcome(l.consume('k'))).toBe('allowed');
  });
});

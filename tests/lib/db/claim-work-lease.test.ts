import { beforeAll, describe, expect, it } from 'vitest';
import { claimWorkLease, instanceId } from '@/lib/db/claim-work-lease';
import { WorkLease } from '@/models';
import { freshDatabase } from '../../support/factories';

/*
 * What is checked: the lease that lets one app instance at a time run the
 * mail retry pass (lib/delivery/start-delivery-services.ts), on the suite's
 * dialect (SQLite under npm test, PostgreSQL under test:postgres). Two
 * holders stand for two instances; times are given explicitly, so nothing
 * depends on the clock.
 */

const t0 = new Date('2026-12-02T12:00:00Z');
const at = (seconds: number) => new Date(t0.getTime() + seconds * 1000);
const TTL_MS = 60_000;

beforeAll(async () => {
  await freshDatabase();
});

describe('claimWorkLease', () => {
  it('one holder at a time; the holder renews; a lease that ran out is taken over', async () => {
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-1', now: t0 })).toBe(true);
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-2', now: at(1) })).toBe(false);
    // Renewal moves the expiry on: instance 2 still cannot take it at t0 + 61 s.
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-1', now: at(30) })).toBe(true);
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-2', now: at(61) })).toBe(false);
    // Instance 1 stops renewing (crashed): after its last expiry (t0 + 90 s) instance 2 takes over.
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-2', now: at(90) })).toBe(true);
    expect(await claimWorkLease('pass-a', TTL_MS, { holder: 'instance-1', now: at(91) })).toBe(false);
    expect((await WorkLease.findByPk('pass-a'))?.holder).toBe('instance-2');
  });

  it('of many simultaneous claims on a free lease exactly one wins', async () => {
    const outcomes = await Promise.all(
      Array.from({ length: 8 }, (_, i) => claimWorkLease('pass-b', TTL_MS, { holder: `instance-${i}`, now: t0 })),
    );
    expect(outcomes.filter(Boolean)).toHaveLength(1);
  });

  it('leases on different work are independent; the default holder is this process', async () => {
    expect(await claimWorkLease('pass-c', TTL_MS)).toBe(true);
    expect(await claimWorkLease('pass-d', TTL_MS, { holder: 'instance-9' })).toBe(true);
    expect((await WorkLease.findByPk('pass-c'))?.holder).toBe(instanceId());
    expect(instanceId()).toContain(`:${process.pid}:`);
  });
});

import os from 'node:os';
import crypto from 'node:crypto';
import { Op } from 'sequelize';
import { db, WorkLease } from '@/models';

const holder = globalThis as unknown as { __nodewrightInstanceId?: string };

/** This app instance's name in leases: host, process id and a random part (a restarted process is a new holder). */
export function instanceId(): string {
  return (holder.__nodewrightInstanceId ??= `${os.hostname()}:${process.pid}:${crypto.randomBytes(4).toString('hex')}`);
}

/**
 * Claims or renews the lease on a kind of scheduled work for `ttlMs`; true
 * when this instance now holds it. Dialect-neutral: the row is created once
 * (INSERT that ignores an existing key), then taken by one conditional
 * UPDATE that succeeds only when the lease is ours already or has run out,
 * so two instances can never both hold it; a crashed holder's lease is taken
 * over once it expires. The holder renews it each time it runs the work.
 */
export async function claimWorkLease(
  name: string,
  ttlMs: number,
  opts: { holder?: string; now?: Date } = {},
): Promise<boolean> {
  await db();
  const me = opts.holder ?? instanceId();
  const now = opts.now ?? new Date();
  await WorkLease.bulkCreate([{ name, holder: '', expiresAt: new Date(0) }], { ignoreDuplicates: true });
  const [claimed] = await WorkLease.update(
    { holder: me, expiresAt: new Date(now.getTime() + ttlMs) },
    { where: { name, [Op.or]: [{ holder: me }, { expiresAt: { [Op.lte]: now } }] } },
  );
  return claimed === 1;
}

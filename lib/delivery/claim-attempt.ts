import { Op, type ModelStatic, type Model } from 'sequelize';

/** A queued message this old was left behind (the process stopped before sending); the retry pass picks it up. */
export const QUEUED_GRACE_MS = 60 * 1000;

/** An attempt that started this long ago and never finished (the process stopped) may be taken over. */
export const STALE_ATTEMPT_MS = 5 * 60 * 1000;

type Attemptable = Model & { status: string; lastAttemptAt: Date | null };

/**
 * Marks a queued or failed message (a delivery or an account message) as
 * being sent by this process; false when another attempt holds it. One
 * conditional UPDATE, so two processes cannot both claim it.
 */
export async function claimAttempt(model: ModelStatic<Attemptable>, id: number, started: Date): Promise<boolean> {
  const stale = new Date(started.getTime() - STALE_ATTEMPT_MS);
  const [claimed] = await model.update({ status: 'sending', lastAttemptAt: started } as never, {
    where: { id, [Op.or]: [{ status: { [Op.ne]: 'sending' } }, { lastAttemptAt: { [Op.lt]: stale } }] } as never,
  });
  return claimed === 1;
}

/** The retry pass's condition: failed and due, queued but left behind, or half-sent by a stopped process. */
export function dueForAttempt(now: Date, queuedGraceMs: number) {
  return {
    [Op.or]: [
      { status: 'failed', nextAttemptAt: { [Op.lte]: now } },
      { status: 'queued', createdAt: { [Op.lte]: new Date(now.getTime() - queuedGraceMs) } },
      { status: 'sending', lastAttemptAt: { [Op.lte]: new Date(now.getTime() - STALE_ATTEMPT_MS) } },
    ],
  };
}

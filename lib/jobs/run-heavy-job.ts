import { ApiError } from '@/lib/api/errors';
import type { HeavyJob, HeavyJobReply, HeavyJobValue } from './heavy-job';
import { heavyJobConfig } from './heavy-job-config';
import { heavyJobPool } from './heavy-job-pool';

export interface HeavyJobOptions {
  /** How long the job may wait for a thread, and then how long it may run (each). */
  budgetSeconds: number;
  /** The answer when the job ran out of its budget (the worker has been terminated). */
  overBudget: () => ApiError;
  /** The answer when the worker died during the job (it has been replaced); `reason` as the worker said. */
  crashed: (reason: string) => ApiError;
}

/** A job's own slots come back within seconds, typically. */
const RETRY_AFTER_LIMIT_SECONDS = 5;
/** Every thread was busy for a whole budget: the queue needs a while to drain. */
const RETRY_AFTER_BUSY_SECONDS = 30;

function takeSlot(jobsByUser: Map<number, number>, userId: number): () => void {
  const { jobsPerUser } = heavyJobConfig();
  const running = jobsByUser.get(userId) ?? 0;
  if (running >= jobsPerUser) {
    throw new ApiError(
      'too_many_requests',
      `You already have ${running} heavy job${running === 1 ? '' : 's'} (PDF renders or long calculations) in progress; at most ${jobsPerUser} run at once per person. Try again when one has finished.`,
      { retryAfterSeconds: RETRY_AFTER_LIMIT_SECONDS, details: { limit: jobsPerUser } },
    );
  }
  jobsByUser.set(userId, running + 1);
  return () => {
    const left = (jobsByUser.get(userId) ?? 1) - 1;
    if (left > 0) jobsByUser.set(userId, left);
    else jobsByUser.delete(userId);
  };
}

/** The message of piscina's error for a worker that exited or ran out of memory during a job; undefined for anything else. */
function workerEnded(err: unknown): string | undefined {
  if (!(err instanceof Error)) return undefined;
  const code = (err as { code?: unknown }).code;
  return /^worker exited/.test(err.message) || (typeof code === 'string' && code.startsWith('ERR_WORKER'))
    ? err.message
    : undefined;
}

/**
 * Runs one heavy job in the worker pool on behalf of a person: refused with
 * 429 while they already have their limit of jobs in progress; stopped
 * (worker terminated, `overBudget`) when it runs longer than its budget, or
 * with 503 when it waited a whole budget for a thread; `crashed` when its
 * worker died. The request thread only waits, so light requests are
 * answered meanwhile.
 */
export async function runHeavyJob<J extends HeavyJob>(
  userId: number,
  job: J,
  options: HeavyJobOptions,
): Promise<HeavyJobValue<J>> {
  const state = heavyJobPool();
  const releaseSlot = takeSlot(state.jobsByUser, userId);
  const jobId = state.nextJobId++;
  const budgetMs = options.budgetSeconds * 1000;
  const controller = new AbortController();
  let running = false;
  let timer = setTimeout(() => controller.abort(), budgetMs);
  state.onStart.set(jobId, () => {
    running = true;
    clearTimeout(timer);
    timer = setTimeout(() => controller.abort(), budgetMs);
  });
  try {
    const reply = (await state.pool.run({ jobId, job }, { signal: controller.signal })) as HeavyJobReply<J>;
    if (!reply.ok) throw new ApiError('unprocessable', reply.message);
    return reply.value;
  } catch (err) {
    if (err instanceof ApiError) throw err;
    if (controller.signal.aborted) {
      if (running) throw options.overBudget();
      throw new ApiError(
        'unavailable',
        `The server is busy with other PDFs and long calculations; this one waited ${options.budgetSeconds} s for a free worker and was not started. Try again shortly.`,
        {
          retryAfterSeconds: RETRY_AFTER_BUSY_SECONDS,
        },
      );
    }
    const reason = state.failures.get(jobId) ?? workerEnded(err);
    if (reason === undefined) throw err;
    console.error(`[nodewright] heavy job ${job.type} for user ${userId}: worker ended (${reason})`);
    throw options.crashed(reason);
  } finally {
    clearTimeout(timer);
    state.onStart.delete(jobId);
    state.failures.delete(jobId);
    releaseSlot();
  }
}

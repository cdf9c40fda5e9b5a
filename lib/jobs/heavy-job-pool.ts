import path from 'node:path';
import { Piscina } from 'piscina';
import type { HeavyJobSignal } from './heavy-job';
import { heavyJobConfig } from './heavy-job-config';

/**
 * The one pool of worker threads of this process (piscina). Kept on
 * globalThis because Next may load a module once per route: one pool, one
 * count of running jobs per person, whichever route asks.
 *
 * The worker runs lib/jobs/heavy-job-worker.ts from the source tree through
 * tsx's loader (`--import tsx`), so the same file serves `next start`
 * (which cannot bundle a worker entry), vitest and tsx scripts; react-pdf's
 * packages export ESM only under the `import` condition, hence
 * `--conditions=import`.
 */
export interface HeavyJobPool {
  pool: Piscina;
  /** Called when a worker starts a job (its run-time budget starts then). */
  onStart: Map<number, () => void>;
  /** Why a worker that ended during a job ended, as it said before exiting. */
  failures: Map<number, string>;
  /** Heavy jobs per user id, running or waiting for a thread. */
  jobsByUser: Map<number, number>;
  nextJobId: number;
}

const KEY = Symbol.for('nodewright.heavyJobPool');
type WithPool = typeof globalThis & { [KEY]?: HeavyJobPool };

export const HEAVY_JOB_WORKER = 'lib/jobs/heavy-job-worker.ts';

function createPool(): HeavyJobPool {
  const { threads } = heavyJobConfig();
  const pool = new Piscina({
    filename: path.join(/*turbopackIgnore: true*/ process.cwd(), HEAVY_JOB_WORKER),
    name: 'runHeavyJobInWorker',
    execArgv: ['--import', 'tsx', '--conditions=import'],
    // one warm worker stays (loading react-pdf and the fonts takes seconds); extra ones end after a quiet minute
    minThreads: 1,
    maxThreads: threads,
    idleTimeout: 60_000,
    maxQueue: Infinity,
  });
  const state: HeavyJobPool = { pool, onStart: new Map(), failures: new Map(), jobsByUser: new Map(), nextJobId: 1 };
  pool.on('message', (message: HeavyJobSignal) => {
    if ('heavyJobStarted' in message) state.onStart.get(message.heavyJobStarted)?.();
    else if ('heavyJobFailed' in message) state.failures.set(message.heavyJobFailed, message.message);
  });
  // A worker that fails outside a job (while starting) is reported here rather than crashing the server.
  pool.on('error', (err: unknown) => console.error('[nodewright] heavy-job worker error:', err));
  return state;
}

export function heavyJobPool(): HeavyJobPool {
  const g = globalThis as WithPool;
  return (g[KEY] ??= createPool());
}

/** Ends the pool's threads (tests and scripts, so the process can exit). */
export async function closeHeavyJobPool(): Promise<void> {
  const g = globalThis as WithPool;
  const state = g[KEY];
  g[KEY] = undefined;
  await state?.pool.destroy();
}

import os from 'node:os';
import { integerSetting } from '@/lib/mail/mail-config';

/**
 * Settings of the heavy-job pool from the environment (listed in README,
 * Configuration). Read on every job, so a test or an operator sees a
 * change at the next job; the thread count is read when the pool starts.
 */
export interface HeavyJobConfig {
  /** Worker threads for PDFs and heavy calcs; leaves one core to the request thread. */
  threads: number;
  /** Heavy jobs one person may have running or queued at once; more → 429. */
  jobsPerUser: number;
  /** Longest a PDF (render or freeze) may run, and wait for a thread, before it is stopped (503). */
  pdfBudgetSeconds: number;
  /** Longest a heavy calculation or a document evaluation may run, and wait, before it is stopped (422). */
  calcBudgetSeconds: number;
}

export function heavyJobConfig(): HeavyJobConfig {
  const cores = typeof os.availableParallelism === 'function' ? os.availableParallelism() : os.cpus().length;
  return {
    threads: integerSetting('NODEWRIGHT_WORKER_THREADS', Math.max(1, Math.min(4, cores - 1)), 1, 64),
    jobsPerUser: integerSetting('NODEWRIGHT_HEAVY_JOBS_PER_USER', 2, 1, 1000),
    pdfBudgetSeconds: integerSetting('NODEWRIGHT_PDF_TIME_BUDGET_SECONDS', 60, 1, 3600),
    calcBudgetSeconds: integerSetting('NODEWRIGHT_CALC_TIME_BUDGET_SECONDS', 30, 1, 3600),
  };
}

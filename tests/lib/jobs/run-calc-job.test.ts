/**
 * Heavy calculations in the worker pool (lib/jobs/run-calc-job.ts over
 * run-heavy-job.ts): the pool's answer is the engine's answer, a person may
 * have at most NODEWRIGHT_HEAVY_JOBS_PER_USER jobs in progress (429 with
 * Retry-After beyond), a calculation over its budget is stopped with a 422
 * naming the inputs that set its cost, a job that waited a whole budget for a
 * thread gets a 503, and the pool keeps serving after each of these.
 * One worker thread, so the queue behaviour is deterministic.
 */
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api/errors';
import { isHeavyCalcKind, listCalcKinds, runCalc } from '@/lib/calc';
import { closeHeavyJobPool, heavyJobPool } from '@/lib/jobs/heavy-job-pool';
import { runCalcJob } from '@/lib/jobs/run-calc-job';

const short = { altitudeKm: 700, inclinationDeg: 98.2, days: 1 };
/** About 5 s on this machine: DOPRI5 over the longest span at the tightest tolerance, low orbit (most revolutions). */
const long = { altitudeKm: 300, inclinationDeg: 98.2, days: 400, integrator: 'dopri5', relTol: 1e-13 };
const failure = (p: Promise<unknown>) =>
  p.then(
    () => undefined,
    (e: unknown) => e as ApiError,
  );

beforeAll(() => {
  process.env.NODEWRIGHT_WORKER_THREADS = '1';
});
afterEach(() => {
  delete process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS;
});
afterAll(async () => {
  delete process.env.NODEWRIGHT_WORKER_THREADS;
  await closeHeavyJobPool();
});

describe('heavy calc kinds', () => {
  it('are flagged in the registry: the long integrations are heavy, the analytic kinds are not', () => {
    expect(
      listCalcKinds()
        .filter((k) => k.heavy)
        .map((k) => k.kind)
        .sort(),
    ).toEqual([
      'disposal-compliance',
      'drag-decay',
      'injection-dispersion',
      'propagation-check',
      'site-revisit',
      'station-contacts',
    ]);
    expect(isHeavyCalcKind('sso-inclination')).toBe(false);
    expect(isHeavyCalcKind('no-such-kind')).toBe(false);
  });

  it('give the engine result from the pool, and bad input the same 400 fields as on the calling thread', async () => {
    expect(await runCalcJob(1, 'propagation-check', short)).toEqual(runCalc('propagation-check', short));
    const bad = await runCalcJob(1, 'propagation-check', { ...short, days: 900 });
    expect(bad).toEqual(runCalc('propagation-check', { ...short, days: 900 }));
    expect(bad.ok).toBe(false);
  }, 60_000);

  it('light kinds never wait for the pool: one answers while the pool is busy', async () => {
    process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS = '2';
    const order: string[] = [];
    const heavy = failure(runCalcJob(1, 'propagation-check', long)).then((e) => order.push(`heavy ${e?.status}`));
    const light = await runCalcJob(1, 'sso-inclination', { altitudeKm: 700 });
    order.push(`light ${light.ok}`);
    await heavy;
    expect(order).toEqual(['light true', 'heavy 422']);
  }, 60_000);
});

describe('per-user limit', () => {
  it('refuses a third job of one person with 429 and Retry-After while two are in progress; others are unaffected', async () => {
    const first = runCalcJob(7, 'propagation-check', short);
    const second = runCalcJob(7, 'propagation-check', short);
    const third = await failure(runCalcJob(7, 'propagation-check', short));
    const otherPerson = runCalcJob(8, 'propagation-check', short);
    expect(third?.status).toBe(429);
    expect(third?.message).toMatch(/at most 2 run at once per person/);
    expect(third?.retryAfterSeconds).toBeGreaterThan(0);
    expect((await Promise.all([first, second, otherPerson])).map((o) => o.ok)).toEqual([true, true, true]);
    // the slots come back once the jobs are done
    expect(heavyJobPool().jobsByUser.get(7)).toBeUndefined();
    expect((await runCalcJob(7, 'propagation-check', short)).ok).toBe(true);
  }, 60_000);
});

describe('time budget', () => {
  it('stops a calculation that runs too long with 422 naming the inputs to change; the pool keeps serving', async () => {
    process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS = '1';
    const err = await failure(runCalcJob(1, 'propagation-check', long));
    expect(err).toBeInstanceOf(ApiError);
    expect(err?.status).toBe(422);
    expect(err?.message).toMatch(
      /ran longer than 1 s, the limit for one calculation, and was stopped: try a shorter span \(days\)/,
    );
    expect(Object.keys(err?.fields ?? {})).toEqual(['days', 'relTol', 'integrator']);
    // with the default budget again: the terminated worker is replaced (its start takes seconds) and serves the next job
    delete process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS;
    expect((await runCalcJob(1, 'propagation-check', short)).ok).toBe(true);
  }, 60_000);

  it('answers 503 with Retry-After for a job that waited a whole budget for the only thread', async () => {
    process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS = '2';
    await runCalcJob(1, 'propagation-check', short); // the worker is warm
    const running = failure(runCalcJob(1, 'propagation-check', long));
    const waiting = await failure(runCalcJob(2, 'propagation-check', short));
    expect(waiting?.status).toBe(503);
    expect(waiting?.message).toMatch(/waited 2 s for a free worker and was not started/);
    expect(waiting?.retryAfterSeconds).toBeGreaterThan(0);
    expect((await running)?.status).toBe(422);
    delete process.env.NODEWRIGHT_CALC_TIME_BUDGET_SECONDS;
    expect((await runCalcJob(2, 'propagation-check', short)).ok).toBe(true);
  }, 60_000);
});

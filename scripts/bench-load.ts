/**
 * `npm run bench:load [-- --seconds N] [-- --clients N] [-- --postgres]`: the
 * app under many people at once, on loopback, bounded in clients and time.
 * Prints figures, asserts nothing.
 *
 * With `--postgres`: a throwaway PostgreSQL cluster (scripts/support/
 * start-postgres.ts, Debian's package) and two app instances on one
 * database in it, sharing NEXTAUTH_SECRET; the clients alternate between
 * the two instances, as a round-robin proxy would send them (each signed in
 * on the first, its session cookie valid on both).
 *
 * Starts the app as `npm start` does (tests' start-app-server: own port, own
 * empty SQLite file and data folder; set NODEWRIGHT_SKIP_BUILD=1 to reuse the
 * current build), adds `--clients` analysts (default 50) who sign in through
 * next-auth and create one memo each from the design-rationale template, then:
 *   (a) save burst: every analyst saves their memo at the same moment —
 *       status counts and p50/p95/max latency (target: all 200, p95 < 1 s);
 *   (c) readers during a save burst: memo reads by a few clients while idle,
 *       then while a burst of saves is under way;
 *   (b) mixed load: every client in a loop of memo reads (50 %), calc calls
 *       (30 %) and saves of its own memo (20 %) for `--seconds` (default 60);
 *       then, for a quarter of that each, memo reads alone, calc calls alone
 *       and GET /api/health — a route handler with no session, database or
 *       work: the framework's own floor, measured in the same run.
 * The load generator runs on the same machine as the app, so every figure
 * includes its share of the cores.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import { startAppServer, type AppServer } from './support/start-app-server';
import { startPostgres, type RunningPostgres } from './support/start-postgres';
import { createDatabase } from './support/postgres-databases';
import { paragraphDoc, signedInAnalystsWithMemos, type LoadAnalyst } from './support/load-clients';
import { latencyLine, percentile } from './support/latency-stats';

type Op = 'memo read' | 'calc' | 'save' | 'trivial route';
interface Sample {
  op: Op;
  ms: number;
  status: number;
}

function argument(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  if (i < 0) return fallback;
  const n = Number(process.argv[i + 1]);
  if (!Number.isFinite(n) || n <= 0 || n > 3600)
    throw new Error(`--${name} takes a number of ${name} between 1 and 3600 (got "${process.argv[i + 1]}")`);
  return n;
}

/** One client's memo and what it last saved, so each save names the right base version. */
interface Client extends LoadAnalyst {
  content: { type: 'doc'; content: unknown[] };
  saves: number;
}

async function timed(op: Op, call: () => Promise<{ status: number }>): Promise<Sample> {
  const started = performance.now();
  try {
    const { status } = await call();
    return { op, ms: performance.now() - started, status };
  } catch {
    return { op, ms: performance.now() - started, status: 0 };
  }
}

const memoRead = (c: Client) => timed('memo read', () => c.session.json(`/api/memos/${c.memoId}`));
const calcCall = (c: Client) =>
  timed('calc', () =>
    c.session.json('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'sso-inclination', inputs: { altitudeKm: 450 + Math.round(Math.random() * 400) } }),
    }),
  );
const trivial = (c: Client) => timed('trivial route', () => c.session.json('/api/health'));

async function save(c: Client): Promise<Sample> {
  c.saves += 1;
  const content = {
    ...c.content,
    content: [...c.content.content, ...paragraphDoc(`Load save ${c.saves} by ${c.email}.`).content],
  };
  let saved: { status: number; body: { version?: number } } | undefined;
  const sample = await timed(
    'save',
    async () =>
      (saved = await c.session.json<{ version?: number }>(`/api/memos/${c.memoId}`, {
        method: 'PATCH',
        body: JSON.stringify({ content, baseVersion: c.version }),
      })),
  );
  if (saved?.status === 200 && saved.body.version) c.version = saved.body.version;
  return sample;
}

function statusCounts(samples: Sample[]): string {
  const counts = new Map<number, number>();
  for (const s of samples) counts.set(s.status, (counts.get(s.status) ?? 0) + 1);
  return [...counts]
    .sort(([a], [b]) => a - b)
    .map(([status, n]) => `${n} × ${status === 0 ? 'no answer' : status}`)
    .join(', ');
}

/** Every client runs `pick` in a loop until the time is up; returns every sample. */
async function runPhase(
  clients: Client[],
  seconds: number,
  pick: (c: Client) => Promise<Sample>,
): Promise<{ samples: Sample[]; seconds: number }> {
  const started = performance.now();
  const deadline = started + seconds * 1000;
  const samples: Sample[] = [];
  await Promise.all(
    clients.map(async (c) => {
      while (performance.now() < deadline) samples.push(await pick(c));
    }),
  );
  return { samples, seconds: (performance.now() - started) / 1000 };
}

function printPhase(title: string, phase: { samples: Sample[]; seconds: number }) {
  console.log(`\n${title} (${phase.seconds.toFixed(1)} s)`);
  const ops = [...new Set(phase.samples.map((s) => s.op))];
  for (const op of ops) {
    const of = phase.samples.filter((s) => s.op === op);
    const errors = of.filter((s) => s.status !== 200).length;
    console.log(
      `  ${op.padEnd(14)} ${String(of.length).padStart(6)} req  ${(of.length / phase.seconds).toFixed(1).padStart(6)} req/s  ${latencyLine(of.map((s) => s.ms))}  errors ${errors}${errors ? ` (${statusCounts(of.filter((s) => s.status !== 200))})` : ''}`,
    );
  }
  if (ops.length > 1)
    console.log(
      `  ${'all'.padEnd(14)} ${String(phase.samples.length).padStart(6)} req  ${(phase.samples.length / phase.seconds).toFixed(1).padStart(6)} req/s`,
    );
}

/** One app instance on SQLite, or a throwaway PostgreSQL cluster with two instances on one database in it. */
async function startServers(postgres: boolean): Promise<{ servers: AppServer[]; cluster?: RunningPostgres }> {
  if (!postgres) return { servers: [await startAppServer()] };
  const cluster = await startPostgres();
  try {
    const shared = {
      DATABASE_URL: await createDatabase(cluster.url(), 'nodewright_bench'),
      NEXTAUTH_SECRET: crypto.randomBytes(32).toString('base64url'),
    };
    // One after the other: the first migrates, seeds and builds if stale.
    const first = await startAppServer(shared);
    return { servers: [first, await startAppServer(shared)], cluster };
  } catch (err) {
    cluster.stop();
    throw err;
  }
}

async function main() {
  const seconds = argument('seconds', 60);
  const count = Math.round(argument('clients', 50));
  const postgres = process.argv.includes('--postgres');
  console.log(
    postgres
      ? 'starting a PostgreSQL cluster and two app instances on one database (builds if stale)…'
      : 'starting the app on SQLite (builds if stale)…',
  );
  const { servers, cluster } = await startServers(postgres);
  try {
    console.log(
      `adding ${count} analysts, signing them in, one memo each${servers.length > 1 ? `, alternating between ${servers.length} instances` : ''}…`,
    );
    const analysts = await signedInAnalystsWithMemos(servers[0].baseUrl, count, {
      label: 'load',
      templateId: 'sso-design-rationale',
    });
    const clients: Client[] = await Promise.all(
      analysts.map(async (a, i) => ({
        ...a,
        session: a.session.copy(servers[i % servers.length].baseUrl),
        saves: 0,
        content: (await a.session.json<{ content: Client['content'] }>(`/api/memos/${a.memoId}`)).body.content,
      })),
    );
    // Warm every route once (first requests compile and cache in Next).
    for (const c of clients.slice(0, 2)) for (const op of [memoRead, calcCall, save, trivial]) await op(c);

    // (a) Save burst.
    const burstStarted = performance.now();
    const burst = await Promise.all(clients.map(save));
    const burstMs = performance.now() - burstStarted;
    const burstLatency = burst.map((s) => s.ms);
    console.log(
      `\n(a) ${count} concurrent saves on ${count} different memos: ${statusCounts(burst)}; p50 ${percentile(burstLatency, 0.5).toFixed(0)} · p95 ${percentile(burstLatency, 0.95).toFixed(0)} · max ${percentile(burstLatency, 1).toFixed(0)} ms; all answered in ${burstMs.toFixed(0)} ms (target: all 200, p95 < 1000 ms)`,
    );

    // (c) Readers idle, then during a save burst.
    const readers = clients.slice(0, Math.min(5, clients.length));
    const idle: Sample[] = [];
    for (let i = 0; i < 10; i++) idle.push(...(await Promise.all(readers.map(memoRead))));
    const during: Sample[] = [];
    let burstDone = false;
    const reading = Promise.all(
      readers.map(async (r) => {
        while (!burstDone) during.push(await memoRead(r));
      }),
    );
    const second = await Promise.all(clients.map(save));
    burstDone = true;
    await reading;
    console.log(`\n(c) memo reads by ${readers.length} clients`);
    console.log(
      `  idle                 ${String(idle.length).padStart(4)} reads  ${latencyLine(idle.map((s) => s.ms))}  errors ${idle.filter((s) => s.status !== 200).length}`,
    );
    console.log(
      `  during ${count} saves     ${String(during.length).padStart(4)} reads  ${latencyLine(during.map((s) => s.ms))}  errors ${during.filter((s) => s.status !== 200).length}  (saves: ${statusCounts(second)})`,
    );

    // (b) Mixed load, each type alone, and the floor.
    const mix = (c: Client) => {
      const r = Math.random();
      return r < 0.5 ? memoRead(c) : r < 0.8 ? calcCall(c) : save(c);
    };
    printPhase(
      `(b) ${count} clients, mix of memo reads 50 %, calc calls 30 %, saves 20 %`,
      await runPhase(clients, seconds, mix),
    );
    printWriteAheadLogSize(servers[0]);
    const quarter = Math.max(1, seconds / 4);
    printPhase(`    ${count} clients, memo reads alone`, await runPhase(clients, quarter, memoRead));
    printPhase(`    ${count} clients, calc calls alone`, await runPhase(clients, quarter, calcCall));
    printPhase(
      `    ${count} clients, GET /api/health (the framework's floor)`,
      await runPhase(clients, quarter, trivial),
    );
  } finally {
    for (const server of servers) server.stop();
    cluster?.stop();
  }
}

/**
 * SQLite only: the size of the write-ahead log after the mix. SQLite copies
 * it back into the database at each automatic checkpoint, but can start it
 * again from the beginning only when no reader is still using it
 * (https://www.sqlite.org/wal.html, "Avoiding Excessively Large WAL Files");
 * a log that kept growing here would mean readers never leave it.
 */
function printWriteAheadLogSize(server: AppServer | undefined) {
  if (!server?.databaseUrl.startsWith('sqlite:')) return;
  const wal = `${server.databaseUrl.slice('sqlite:'.length)}-wal`;
  const bytes = fs.existsSync(wal) ? fs.statSync(wal).size : 0;
  console.log(`  SQLite write-ahead log after the mix: ${(bytes / 2 ** 20).toFixed(1)} MiB`);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});

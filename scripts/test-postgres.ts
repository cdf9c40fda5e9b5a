/**
 * `npm run test:postgres`: the unit and API suites against a real PostgreSQL
 * server. Starts a throwaway cluster (scripts/support/start-postgres.ts),
 * runs vitest with NODEWRIGHT_TEST_POSTGRES_URL naming its maintenance
 * database — every test file and every app server then works in a fresh
 * database of its own (tests/support/temp-database.ts,
 * scripts/support/start-app-server.ts) — and stops and removes the cluster
 * afterwards, whatever the outcome. Arguments go to vitest
 * (`npm run test:postgres -- tests/migrations`).
 */
import { spawn } from 'node:child_process';
import path from 'node:path';
import { startPostgres } from './support/start-postgres';

async function main(): Promise<number> {
  const cluster = await startPostgres();
  console.log(`[test:postgres] throwaway cluster on 127.0.0.1:${cluster.port} in ${cluster.dir}`);
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    cluster.stop();
    console.log('[test:postgres] cluster stopped and removed');
  };
  process.on('exit', stop);
  try {
    const vitest = path.resolve('node_modules/vitest/vitest.mjs');
    const args = process.argv.slice(2);
    // The browser tests drive the same app through Chromium; the database questions are answered by the API suite.
    const selection = args.length > 0 ? args : ['tests/lib', 'tests/migrations', 'tests/scripts', 'tests/api'];
    const child = spawn(process.execPath, [vitest, 'run', ...selection], {
      stdio: 'inherit',
      env: { ...process.env, NODEWRIGHT_TEST_POSTGRES_URL: cluster.url() },
    });
    for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => child.kill(signal));
    return await new Promise<number>((resolve) =>
      child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0))),
    );
  } finally {
    stop();
  }
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  },
);

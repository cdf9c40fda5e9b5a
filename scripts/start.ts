/**
 * `npm start`: migrate, seed the demo organisation on an empty database,
 * build if the sources are newer than the last build, then serve.
 */
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { closeDatabase, connectDatabase } from '../lib/db/connection';
import { withStartupLock } from '../lib/db/with-startup-lock';
import { migrateUp } from '../lib/db/migrate';
import { seedDemo } from '../lib/demo/seed-demo';
import { resolveAuthSecret } from '../lib/config/auth-secret';

const root = process.cwd();
const SOURCE_DIRS = ['app', 'components', 'lib', 'models', 'public', 'types'];
const SOURCE_FILES = [
  'next.config.mjs',
  'instrumentation.ts',
  'tailwind.config.ts',
  'postcss.config.mjs',
  'tsconfig.json',
  'package-lock.json',
];

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = 0;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

function buildIsStale(): boolean {
  const buildId = path.join(root, '.next', 'BUILD_ID');
  if (!fs.existsSync(buildId)) return true;
  const built = fs.statSync(buildId).mtimeMs;
  const sources = Math.max(
    ...SOURCE_DIRS.map((d) => newestMtime(path.join(root, d))),
    ...SOURCE_FILES.map((f) => newestMtime(path.join(root, f))),
  );
  return sources > built;
}

async function main() {
  const port = process.env.PORT ?? '3000';
  process.env.PORT = port;
  process.env.NEXTAUTH_URL ??= `http://localhost:${port}`;
  process.env.NEXTAUTH_SECRET = resolveAuthSecret();

  // One instance at a time migrates and seeds (several may start together against one PostgreSQL database).
  await withStartupLock(await connectDatabase(), async () => {
    const applied = await migrateUp();
    if (applied.length) console.log(`[nodewright] migrations applied: ${applied.join(', ')}`);
    if (process.env.NODEWRIGHT_DEMO !== 'off') {
      const { seeded } = await seedDemo();
      if (seeded) console.log('[nodewright] demo organisation seeded (see README for the accounts)');
    }
  });
  await closeDatabase();

  const nextBin = path.join(root, 'node_modules', 'next', 'dist', 'bin', 'next');
  if (process.env.NODEWRIGHT_SKIP_BUILD !== '1' && buildIsStale()) {
    console.log('[nodewright] building the app (about a minute)…');
    const build = spawnSync(process.execPath, [nextBin, 'build'], { stdio: 'inherit', env: process.env });
    if (build.status !== 0) process.exit(build.status ?? 1);
  }

  // scripts/support/serve-app.ts: `next start` behind our own HTTP server, on HOST (loopback unless set) and PORT.
  process.env.HOST = process.env.HOST?.trim() || '127.0.0.1';
  console.log(`[nodewright] serving at ${process.env.NEXTAUTH_URL} (listening on ${process.env.HOST}:${port})`);
  const tsxCli = path.join(root, 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const server = spawn(process.execPath, [tsxCli, path.join(root, 'scripts', 'support', 'serve-app.ts')], {
    stdio: 'inherit',
    // libuv's threadpool (4 threads unless UV_THREADPOOL_SIZE says otherwise; Node.js documentation,
    // "Command-line API", UV_THREADPOOL_SIZE) runs every SQLite statement (node-sqlite3), the gzip of every
    // response, file reads and password hashing. With four, a save's statements queued behind other
    // requests' compression; eight keeps the write lock's turns short (bench:load, DEVELOPERS.md).
    env: { ...process.env, NODE_ENV: 'production', UV_THREADPOOL_SIZE: process.env.UV_THREADPOOL_SIZE ?? '8' },
  });
  const stop = (signal: NodeJS.Signals) => server.kill(signal);
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  server.on('exit', (code) => process.exit(code ?? 0));
}

main().catch((err) => {
  console.error('[nodewright] could not start:', err instanceof Error ? err.message : err);
  process.exit(1);
});

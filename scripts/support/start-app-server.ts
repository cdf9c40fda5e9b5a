import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { createDatabase } from './postgres-databases';

/**
 * Starts the real app exactly as `npm start` does (migrate, seed the demo
 * organisation, build if stale, serve) on a free port with its own empty
 * database, for tests and benchmarks: a SQLite file in its data folder, or,
 * when NODEWRIGHT_TEST_POSTGRES_URL names a PostgreSQL cluster
 * (`npm run test:postgres`), a fresh database there. A DATABASE_URL in
 * `extraEnv` wins: two instances on one database.
 */
export interface AppServer {
  baseUrl: string;
  dataDir: string;
  databaseUrl: string;
  stop: () => void;
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const addr = srv.address();
      const port = typeof addr === 'object' && addr ? addr.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (child.exitCode !== null) throw new Error(`app server exited with code ${child.exitCode} before it was ready`);
    try {
      const res = await fetch(url, { redirect: 'manual' });
      if (res.status < 500) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`app server did not answer at ${url} within ${timeoutMs / 1000} s`);
}

export async function startAppServer(extraEnv: Record<string, string> = {}): Promise<AppServer> {
  const port = await freePort();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-app-'));
  const baseUrl = `http://localhost:${port}`;
  const logFile = path.join(dataDir, 'server.log');
  const postgresAdminUrl = process.env.NODEWRIGHT_TEST_POSTGRES_URL;
  const databaseUrl =
    extraEnv.DATABASE_URL ??
    (postgresAdminUrl
      ? await createDatabase(postgresAdminUrl, 'nodewright_app')
      : `sqlite:${path.join(dataDir, 'app.sqlite')}`);
  const log = fs.openSync(logFile, 'a');
  const child = spawn(process.execPath, [path.resolve('node_modules/tsx/dist/cli.mjs'), 'scripts/start.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(port),
      NODEWRIGHT_DATA_DIR: dataDir,
      NEXTAUTH_URL: baseUrl,
      ...extraEnv,
      DATABASE_URL: databaseUrl,
    },
    stdio: ['ignore', log, log],
    detached: true,
  });
  const stop = () => {
    if (child.pid) {
      try {
        process.kill(-child.pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForServer(`${baseUrl}/signin`, child, 300_000);
  } catch (err) {
    const out = fs.readFileSync(logFile, 'utf8');
    stop();
    throw new Error(`${(err as Error).message}\n--- server log ---\n${out.slice(-4000)}`);
  }
  return { baseUrl, dataDir, databaseUrl, stop };
}

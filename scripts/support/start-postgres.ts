import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from './start-app-server';

/**
 * A throwaway PostgreSQL cluster for tests and benchmarks, from Debian's
 * postgresql package: `initdb` into a temporary folder, `pg_ctl start` on a
 * free loopback port with its Unix socket in the same folder, `pg_ctl stop`
 * and the folder removed afterwards. Nothing is installed or configured
 * system-wide.
 *
 * initdb and postgres refuse to run as root (PostgreSQL 15 documentation,
 * 19.1 "The PostgreSQL User Account"). Started by root, the cluster runs as
 * the unprivileged account named by NODEWRIGHT_POSTGRES_OS_USER (default
 * `postgres`, which Debian's package creates; `nobody` works too) through
 * `runuser`, and the folder is handed to that account first.
 *
 * Local trust authentication (initdb --auth=trust) on 127.0.0.1 only, and
 * durability switched off (fsync, synchronous_commit, full_page_writes): the
 * cluster holds test data that is thrown away, never anything to keep.
 */
export interface RunningPostgres {
  port: number;
  /** Folder holding the data directory, the socket and the log. */
  dir: string;
  /** URL of a database in this cluster (the superuser `postgres`, no password, loopback TCP). */
  url(database?: string): string;
  stop(): void;
}

const BIN_ROOT = '/usr/lib/postgresql';

/** Debian's newest installed PostgreSQL bin folder, or null when the package is missing. */
export function findPostgresBin(): string | null {
  if (process.env.NODEWRIGHT_POSTGRES_BIN) return process.env.NODEWRIGHT_POSTGRES_BIN;
  if (!fs.existsSync(BIN_ROOT)) return null;
  const versions = fs
    .readdirSync(BIN_ROOT)
    .filter((v) => fs.existsSync(path.join(BIN_ROOT, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length > 0 ? path.join(BIN_ROOT, versions[0], 'bin') : null;
}

function asClusterUser(bin: string, args: string[], user: string | null): string {
  const cmd = user ? 'runuser' : bin;
  const argv = user ? ['-u', user, '--', bin, ...args] : args;
  const out = spawnSync(cmd, argv, { encoding: 'utf8', cwd: os.tmpdir() });
  if (out.status !== 0)
    throw new Error(`${path.basename(bin)} ${args.join(' ')} failed (${out.status}):\n${out.stdout}\n${out.stderr}`);
  return out.stdout;
}

export async function startPostgres(): Promise<RunningPostgres> {
  const bin = findPostgresBin();
  if (!bin)
    throw new Error(
      `PostgreSQL is not installed (no ${BIN_ROOT}/*/bin/initdb). On Debian: apt-get install -y postgresql`,
    );
  const user = process.getuid?.() === 0 ? process.env.NODEWRIGHT_POSTGRES_OS_USER || 'postgres' : null;
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-pg-'));
  const dataDir = path.join(dir, 'data');
  const logFile = path.join(dir, 'server.log');
  if (user) {
    execFileSync('chown', [user, dir]);
    fs.chmodSync(dir, 0o700);
  }
  const port = await freePort();
  asClusterUser(
    path.join(bin, 'initdb'),
    ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8', '--no-sync'],
    user,
  );
  const settings = [
    `-p ${port}`,
    "-c listen_addresses='127.0.0.1'",
    `-c unix_socket_directories='${dir}'`,
    '-c fsync=off',
    '-c synchronous_commit=off',
    '-c full_page_writes=off',
    '-c max_connections=300',
    '-c shared_buffers=64MB',
  ].join(' ');
  const stop = () => {
    try {
      asClusterUser(path.join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'immediate', '-w', 'stop'], user);
    } catch {
      /* not running */
    }
    fs.rmSync(dir, { recursive: true, force: true });
  };
  try {
    asClusterUser(
      path.join(bin, 'pg_ctl'),
      ['-D', dataDir, '-l', logFile, '-o', settings, '-w', '-t', '60', 'start'],
      user,
    );
  } catch (err) {
    const log = fs.existsSync(logFile) ? fs.readFileSync(logFile, 'utf8').slice(-3000) : '';
    stop();
    throw new Error(`${(err as Error).message}\n--- server log ---\n${log}`);
  }
  return {
    port,
    dir,
    url: (database = 'postgres') => `postgres://postgres@127.0.0.1:${port}/${database}`,
    stop,
  };
}

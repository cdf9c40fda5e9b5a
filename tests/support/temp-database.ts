import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { closeDatabase } from '@/lib/db/connection';
import { createDatabase, dropDatabase } from '../../scripts/support/postgres-databases';

// Every test file gets its own empty database and data folder (for generated secrets):
// a SQLite file by default, a fresh PostgreSQL database in the cluster named by
// NODEWRIGHT_TEST_POSTGRES_URL under `npm run test:postgres`.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-test-'));
const postgresAdminUrl = process.env.NODEWRIGHT_TEST_POSTGRES_URL;
process.env.DATABASE_URL = postgresAdminUrl
  ? await createDatabase(postgresAdminUrl, 'nodewright_test')
  : `sqlite:${path.join(dir, 'test.sqlite')}`;
process.env.NODEWRIGHT_DATA_DIR = dir;

afterAll(async () => {
  await closeDatabase();
  if (postgresAdminUrl) await dropDatabase(postgresAdminUrl, process.env.DATABASE_URL!);
  fs.rmSync(dir, { recursive: true, force: true });
});

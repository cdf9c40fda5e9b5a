import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';
import { closeDatabase } from '@/lib/db/connection';

// Every test file gets its own empty SQLite file (and data folder for generated secrets).
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-test-'));
process.env.DATABASE_URL = `sqlite:${path.join(dir, 'test.sqlite')}`;
process.env.NODEWRIGHT_DATA_DIR = dir;

afterAll(async () => {
  await closeDatabase();
  fs.rmSync(dir, { recursive: true, force: true });
});

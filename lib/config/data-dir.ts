import fs from 'node:fs';
import path from 'node:path';

/** Folder for local state (SQLite file, generated secrets, uploads). Relative to the working directory. */
export function dataDir(): string {
  const dir = path.resolve(/*turbopackIgnore: true*/ process.cwd(), process.env.NODEWRIGHT_DATA_DIR ?? 'data');
  fs.mkdirSync(dir, { recursive: true });
  return dir;
}

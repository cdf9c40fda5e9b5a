import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { dataDir } from './data-dir';

/**
 * NEXTAUTH_SECRET from the environment, or one generated once and kept in
 * data/nextauth-secret so that sessions survive restarts.
 */
export function resolveAuthSecret(): string {
  const fromEnv = process.env.NEXTAUTH_SECRET;
  if (fromEnv && fromEnv.length > 0) return fromEnv;
  const file = path.join(dataDir(), 'nextauth-secret');
  if (fs.existsSync(file)) {
    const kept = fs.readFileSync(file, 'utf8').trim();
    if (kept.length >= 32) return kept;
  }
  const secret = crypto.randomBytes(48).toString('base64url');
  fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

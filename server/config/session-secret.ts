import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { varDir } from './paths';

/** SESSION_SECRET when set; otherwise one made on first start and kept in var/, so restarts keep sessions. */
export function sessionSecret(fromEnv: string | undefined): string {
  if (fromEnv) return fromEnv;
  const file = path.join(varDir, 'session-secret');
  if (!existsSync(file)) {
    mkdirSync(varDir, { recursive: true });
    writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

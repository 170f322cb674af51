import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { AppConfig } from './app-config.js';

export const JWT_SECRET = Symbol('JWT_SECRET');

/**
 * The token-signing secret: JWT_SECRET when set; otherwise one kept in the data folder (so
 * sign-ins survive a restart of the embedded set-up); with DATABASE_URL and no JWT_SECRET,
 * a fresh one per process (tokens then end with the process: set JWT_SECRET for servers).
 */
export function resolveJwtSecret(config: AppConfig): string {
  if (config.jwtSecret) return config.jwtSecret;
  if (config.databaseUrl || config.dataDir.startsWith('memory://')) return randomBytes(32).toString('hex');
  const file = join(config.dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(config.dataDir, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

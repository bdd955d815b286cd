import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { defaultDatabaseUrl } from '@tunnelwright/db';

/** Everything the API reads from its environment, resolved once at start-up. */
export interface AppConfig {
  databaseUrl: string;
  redisUrl: string;
  smtpUrl: string;
  /** Origin the browser uses; links in e-mails start with it. */
  publicUrl: string;
  port: number;
  /** Whether the demo conveniences (dev mailbox) are on. */
  demoMode: boolean;
  /** Folder where the local SMTP fake stores received messages as `.eml` files. */
  mailDir: string;
  /** Built Angular client served for non-API paths. */
  webDist: string;
  jwtSecret: string;
  mailFrom: string;
  /** Value for Express `trust proxy`, e.g. `1` behind one reverse proxy; unset means direct connections. */
  trustProxy: string | undefined;
  logLevel: string;
}

/** Minimum length of a configured JWT secret, in characters. */
const minimumSecretLength = 32;

/**
 * Reads the HS256 secret from `JWT_SECRET`, or from the secret file, creating that file (mode 0600) with
 * 48 random bytes on first start so restarts keep existing sessions valid.
 */
export function resolveJwtSecret(env: NodeJS.ProcessEnv, secretFile: string): string {
  const fromEnv = env.JWT_SECRET;
  if (fromEnv) {
    if (fromEnv.length < minimumSecretLength) {
      throw new Error(`JWT_SECRET must be at least ${minimumSecretLength} characters long`);
    }
    return fromEnv;
  }
  if (existsSync(secretFile)) {
    const stored = readFileSync(secretFile, 'utf8').trim();
    if (stored.length >= minimumSecretLength) return stored;
  }
  mkdirSync(dirname(secretFile), { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(secretFile, `${secret}\n`, { mode: 0o600 });
  chmodSync(secretFile, 0o600);
  return secret;
}

/** Builds the configuration from `env` (default: `process.env`). */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const port = Number(env.PORT ?? 3000);
  if (!Number.isInteger(port) || port <= 0 || port > 65535) {
    throw new Error(`PORT must be a TCP port number, got "${env.PORT}"`);
  }
  const publicUrl = (env.PUBLIC_URL ?? 'http://localhost:3000').replace(/\/+$/, '');
  return {
    databaseUrl: env.DATABASE_URL ?? defaultDatabaseUrl,
    redisUrl: env.REDIS_URL ?? 'redis://127.0.0.1:63790',
    smtpUrl: env.SMTP_URL ?? 'smtp://127.0.0.1:2525',
    publicUrl,
    port,
    demoMode: env.DEMO_MODE === 'true',
    mailDir: resolve(env.MAIL_DIR ?? '.data/mail'),
    webDist: resolve(env.WEB_DIST ?? 'dist/web/browser'),
    jwtSecret: resolveJwtSecret(env, resolve(env.JWT_SECRET_FILE ?? '.data/jwt-secret')),
    mailFrom: env.MAIL_FROM ?? 'Tunnelwright <no-reply@tunnelwright.invalid>',
    trustProxy: env.TRUST_PROXY,
    logLevel: env.LOG_LEVEL ?? 'info',
  };
}

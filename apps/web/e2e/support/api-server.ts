import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createWriteStream, existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { startMailCatcher, type MailCatcher } from './mail-catcher';
import { resetTestDatabase } from './reset-test-database';
import { acquireRunLock } from './run-lock';

/** The repository root, two folders above `apps/web/e2e`. */
export const repoRoot = resolve(import.meta.dirname, '../../../..');

const port = Number(process.env.TW_E2E_PORT ?? 3100);
/** Where the browser reaches the API and the built client. */
export const baseUrl = `http://127.0.0.1:${port}`;
/** The database the browser tests seed and the API, worker and set-up code share. */
export const databaseUrl = process.env.TW_E2E_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/tunnelwright_e2e';
/** The queue of the API and of any worker a browser test starts. */
export const redisUrl = process.env.TW_E2E_REDIS_URL ?? 'redis://127.0.0.1:63790/1';
const webDist = join(repoRoot, 'dist/web/browser');
const logFile = '/tmp/tw-e2e-api.log';

/** A running API with its mail catcher. */
export interface ApiServer {
  readonly baseUrl: string;
  readonly mail: MailCatcher;
  stop(): Promise<void>;
}

async function waitForHealth(child: ChildProcess, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`The API exited with code ${child.exitCode} before answering; see ${logFile}`);
    }
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) {
        return;
      }
    } catch {
      // Not listening yet.
    }
    await new Promise((done) => setTimeout(done, 250));
  }
  throw new Error(`The API did not answer ${baseUrl}/api/health within ${timeoutMs / 1000} s; see ${logFile}`);
}

/**
 * Waits for other browser-test runs to finish, empties the e2e database and seeds the demo data into it,
 * then starts the real API (built client included) on port 3100 in demo mode, mailing into a throw-away
 * catcher, and waits until it is healthy.
 */
export async function startApiServer(): Promise<ApiServer> {
  if (!existsSync(join(webDist, 'index.html'))) {
    throw new Error('dist/web/browser is missing: run `npx ng build --configuration production` first.');
  }
  const releaseLock = await acquireRunLock();
  try {
    return await startLocked(releaseLock);
  } catch (error) {
    releaseLock();
    throw error;
  }
}

async function portAnswers(): Promise<boolean> {
  try {
    await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(2_000) });
    return true;
  } catch {
    return false;
  }
}

async function startLocked(releaseLock: () => void): Promise<ApiServer> {
  if (await portAnswers()) {
    throw new Error(`Something already answers on ${baseUrl}; stop it (ss -ltnp 'sport = :${port}') and run again.`);
  }
  await resetTestDatabase(databaseUrl);
  const seed = spawnSync('node', ['--import', 'tsx', 'scripts/seed.ts'], {
    cwd: repoRoot,
    env: { ...process.env, DATABASE_URL: databaseUrl, SEED_DATABASE_URL: databaseUrl },
    encoding: 'utf8',
    timeout: 120_000,
  });
  if (seed.status !== 0) {
    throw new Error(`Seeding the test database failed:\n${seed.stdout}\n${seed.stderr}`);
  }

  const mail = await startMailCatcher();
  const log = createWriteStream(logFile, { flags: 'w' });
  const child = spawn('node', ['--import', 'tsx', 'apps/api/src/server.ts'], {
    cwd: repoRoot,
    env: {
      ...process.env,
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      REDIS_URL: redisUrl,
      SMTP_URL: `smtp://127.0.0.1:${mail.port}`,
      MAIL_DIR: mail.mailDir,
      DEMO_MODE: 'true',
      PUBLIC_URL: baseUrl,
      WEB_DIST: webDist,
      JWT_SECRET: randomBytes(48).toString('base64url'),
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);

  try {
    await waitForHealth(child, 60_000);
  } catch (error) {
    child.kill('SIGKILL');
    await mail.stop();
    throw error;
  }

  return {
    baseUrl,
    mail,
    stop: async () => {
      if (child.exitCode === null) {
        const exited = new Promise((done) => child.once('exit', done));
        child.kill('SIGTERM');
        const timer = setTimeout(() => child.kill('SIGKILL'), 5_000);
        await exited;
        clearTimeout(timer);
      }
      await mail.stop();
      log.end();
      releaseLock();
    },
  };
}

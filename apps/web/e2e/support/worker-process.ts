import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { databaseUrl, redisUrl, repoRoot } from './api-server';
import { useBrowserSuite, type BrowserSuite } from './browser-suite';
import { openDemoTest, type DemoTestRecord } from './demo-test';

/**
 * Gives the API and the worker, both child processes started after this, one raw store, one upload spool and a
 * queue prefix of this run's own. Call it before the API starts.
 */
export function shareStoresWithWorker(): void {
  Object.assign(process.env, {
    RAW_STORE: 'fs',
    RAW_STORE_DIR: mkdtempSync(join(tmpdir(), 'tw-e2e-raw-')),
    UPLOAD_TMP_DIR: mkdtempSync(join(tmpdir(), 'tw-e2e-upload-')),
    QUEUE_PREFIX: `tw-e2e-${Date.now().toString(36)}`,
  });
}

/** A running background worker; `stop` ends it, gracefully first. */
export interface WorkerProcess {
  stop(): Promise<void>;
}

/** Starts the background worker on the API's database, queue and raw store, so uploads are reduced; its output goes to `logFile`. */
export function startWorkerProcess(logFile: string): WorkerProcess {
  const log = createWriteStream(logFile, { flags: 'w' });
  const child: ChildProcess = spawn('node', ['--import', 'tsx', 'apps/worker/src/main.ts'], {
    cwd: repoRoot,
    env: { ...process.env, DATABASE_URL: databaseUrl, REDIS_URL: redisUrl, LOG_LEVEL: 'info' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);
  return {
    stop: async () => {
      if (child.exitCode !== null) return;
      const exited = new Promise((done) => child.once('exit', done));
      child.kill('SIGTERM');
      const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
      await exited;
      clearTimeout(timer);
    },
  };
}

/**
 * A browser suite whose uploads are reduced: the API and a background worker share their stores, and the demo
 * test `record` is opened before the browser starts. The worker stops before the API does.
 */
export function useReducingSuite(record: DemoTestRecord, workerLog: string): BrowserSuite {
  let worker: WorkerProcess | undefined;
  return useBrowserSuite({
    beforeApiStart: shareStoresWithWorker,
    afterApiStart: async () => {
      await openDemoTest(record);
      worker = startWorkerProcess(workerLog);
    },
    beforeApiStop: () => worker?.stop(),
    setupTimeoutMs: 180_000,
  });
}

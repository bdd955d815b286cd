import { mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const lockDir = '/tmp/tw-e2e.lock';

function holderAlive(): boolean {
  try {
    const pid = Number(readFileSync(join(lockDir, 'pid'), 'utf8'));
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/**
 * Lets one browser-test file at a time own port 3100 and the e2e database, across test runs started
 * by different people on this machine. A lock left by a process that has died is taken over.
 */
export async function acquireRunLock(timeoutMs = 10 * 60_000): Promise<() => void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      mkdirSync(lockDir);
      writeFileSync(join(lockDir, 'pid'), String(process.pid));
      return () => rmSync(lockDir, { recursive: true, force: true });
    } catch {
      // Give the holder a moment to write its pid before judging it dead.
      await new Promise((done) => setTimeout(done, 500));
      if (!holderAlive()) {
        rmSync(lockDir, { recursive: true, force: true });
        continue;
      }
      if (Date.now() > deadline) {
        throw new Error(`Another browser-test run still holds ${lockDir} after ${timeoutMs / 1000} s`);
      }
    }
  }
}

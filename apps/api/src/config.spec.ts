import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadConfig, resolveJwtSecret } from './config';

describe('resolveJwtSecret', () => {
  it('creates the secret file once with mode 0600 and reads it back afterwards', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'tw-secret-')), 'nested', 'jwt-secret');
    const first = resolveJwtSecret({}, file);
    expect(first.length).toBeGreaterThanOrEqual(32);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(resolveJwtSecret({}, file)).toBe(first);
    expect(readFileSync(file, 'utf8').trim()).toBe(first);
  });

  it('prefers JWT_SECRET and refuses a short one', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'tw-secret-')), 'jwt-secret');
    expect(resolveJwtSecret({ JWT_SECRET: 'x'.repeat(40) }, file)).toBe('x'.repeat(40));
    expect(() => resolveJwtSecret({ JWT_SECRET: 'short' }, file)).toThrow(/at least 32/);
  });
});

describe('loadConfig', () => {
  it('uses the documented defaults', () => {
    const config = loadConfig({ JWT_SECRET: 'y'.repeat(40) });
    expect(config).toMatchObject({
      redisUrl: 'redis://127.0.0.1:63790',
      smtpUrl: 'smtp://127.0.0.1:2525',
      publicUrl: 'http://localhost:3000',
      port: 3000,
      demoMode: false,
    });
    expect(config.webDist).toMatch(/dist\/web\/browser$/);
  });

  it('rejects a port that is not one', () => {
    expect(() => loadConfig({ JWT_SECRET: 'y'.repeat(40), PORT: 'eighty' })).toThrow(/PORT/);
  });
});

import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';

/** The part of a Compose file these checks read. */
interface ComposeService {
  image?: string;
  build?: { context: string; dockerfile: string };
  command?: string[];
  environment?: Record<string, string>;
  volumes?: string[];
  deploy?: { replicas?: number };
  depends_on?: Record<string, { condition: string }> | string[];
}

const dockerDir = dirname(fileURLToPath(import.meta.url));
const compose = parse(readFileSync(join(dockerDir, 'compose.yaml'), 'utf8'), { merge: true }) as {
  services: Record<string, ComposeService>;
};
const services = compose.services;

/** Source paths of the `COPY` lines of a Dockerfile that copy from the build context (not from a stage). */
function copiedPaths(dockerfile: string): string[] {
  return readFileSync(dockerfile, 'utf8')
    .split('\n')
    .map((line) => line.trim())
    .filter((line) => /^COPY\s/i.test(line) && !/--from=/i.test(line))
    .flatMap((line) => {
      const parts = line.split(/\s+/).slice(1).filter((part) => !part.startsWith('--'));
      return parts.slice(0, -1);
    });
}

const built = Object.entries(services).filter(([, service]) => service.build !== undefined);

describe('docker/compose.yaml', () => {
  it('builds the api, the worker and the migration from this repository', () => {
    expect(built.map(([name]) => name).sort()).toEqual(['api', 'migrate', 'worker']);
  });

  for (const [name, service] of built) {
    describe(`service ${name}`, () => {
      const context = resolve(dockerDir, service.build?.context ?? '.');
      const dockerfile = resolve(context, service.build?.dockerfile ?? 'Dockerfile');

      it('names a build context and a Dockerfile that exist', () => {
        expect(existsSync(join(context, 'package.json'))).toBe(true);
        expect(existsSync(dockerfile)).toBe(true);
      });

      it('copies only paths that exist in the build context', () => {
        const missing = copiedPaths(dockerfile).filter((path) => !existsSync(join(context, path)));
        expect(missing).toEqual([]);
      });
    });
  }

  it('runs two replicas of the api and of the worker', () => {
    expect(services.api.deploy?.replicas).toBe(2);
    expect(services.worker.deploy?.replicas).toBe(2);
  });

  it('starts the api and the worker only after the migration succeeded', () => {
    for (const name of ['api', 'worker']) {
      expect(services[name].depends_on).toMatchObject({ migrate: { condition: 'service_completed_successfully' } });
    }
    expect(services.migrate.command).toEqual(['node', '--import', 'tsx', 'scripts/migrate.ts']);
  });

  it('gives every api replica the same signing secret and no demo conveniences', () => {
    expect(services.api.environment?.JWT_SECRET).toMatch(/^\$\{JWT_SECRET:\?/);
    expect(services.api.environment?.DEMO_MODE).toBe('false');
    expect(services.api.environment?.DATABASE_URL).toContain('${DATABASE_URL:-');
    expect(services.worker.environment?.REDIS_URL).toContain('${REDIS_URL:-');
  });

  it('runs PostgreSQL 15 and Redis 7 with append-only persistence and no eviction', () => {
    expect(services.postgres.image).toBe('postgres:15');
    expect(services.redis.image).toBe('redis:7');
    const command = services.redis.command?.join(' ') ?? '';
    expect(command).toContain('--appendonly yes');
    expect(command).toContain('--maxmemory-policy noeviction');
  });

  it('mounts only files that exist for the proxy', () => {
    const bindSources = (services.proxy.volumes ?? [])
      .map((volume) => volume.split(':')[0])
      .filter((source) => source.startsWith('.'));
    expect(bindSources.length).toBeGreaterThan(0);
    for (const source of bindSources) expect(existsSync(resolve(dockerDir, source))).toBe(true);
  });
});

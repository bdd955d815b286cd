import { rmSync } from 'node:fs';
import { access, lstat, mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build, stop, type Plugin } from 'esbuild';

const entry = fileURLToPath(new URL('./reduction-processor.ts', import.meta.url));
const tsconfig = fileURLToPath(new URL('../../../../tsconfig.json', import.meta.url));
const skip = Symbol('resolving a package');

/**
 * Leaves every package of node_modules out of the bundle, imported by its absolute path: the bundle is
 * written to a temporary folder, from where a bare `import 'knex'` would find no node_modules.
 */
const packagesByAbsolutePath: Plugin = {
  name: 'packages-by-absolute-path',
  setup(b) {
    b.onResolve({ filter: /^[^./]/ }, async (args) => {
      if (args.pluginData === skip) return undefined;
      const resolved = await b.resolve(args.path, { kind: args.kind, importer: args.importer, resolveDir: args.resolveDir, pluginData: skip });
      if (resolved.errors.length > 0 || resolved.external) return resolved;
      return resolved.path.includes('/node_modules/') ? { path: resolved.path, external: true } : resolved;
    });
  },
};

/** Whether process `pid` is still running. */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Removes the bundle folders of this user's workers that died without cleaning up (SIGKILL, a crash). */
async function removeLeftovers(): Promise<void> {
  for (const name of await readdir(tmpdir())) {
    const pid = Number(/^tunnelwright-worker-(\d+)-/.exec(name)?.[1]);
    if (!pid || pid === process.pid || alive(pid)) continue;
    const path = join(tmpdir(), name);
    const stats = await lstat(path).catch(() => undefined);
    if (stats?.isDirectory() && stats.uid === process.getuid?.()) await rm(path, { recursive: true, force: true }).catch(() => undefined);
  }
}

async function exists(path: string): Promise<boolean> {
  return access(path).then(
    () => true,
    () => false,
  );
}

async function bundle(): Promise<string> {
  try {
    const result = await build({
      entryPoints: [entry],
      bundle: true,
      write: false,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      tsconfig,
      keepNames: true,
      logLevel: 'silent',
      plugins: [packagesByAbsolutePath],
    });
    const code = result.outputFiles[0]?.contents;
    if (!code) throw new Error(`esbuild wrote nothing for ${entry}`);
    await removeLeftovers();
    // A folder of this process's own, readable by its user alone: the thread runs whatever code is found
    // there, so it must never be a file someone else could have put at a name known in advance.
    const dir = await mkdtemp(join(tmpdir(), `tunnelwright-worker-${process.pid}-`));
    process.once('exit', () => rmSync(dir, { recursive: true, force: true }));
    const file = join(dir, 'reduction-processor.mjs');
    await writeFile(file, code, { mode: 0o600 });
    return file;
  } finally {
    // esbuild's service process has done its work; it would only hold memory beside the worker.
    await stop();
  }
}

let built: Promise<string> | undefined;

/**
 * The sandboxed reduction processor as one plain JavaScript module, built from the current sources.
 * The sandbox thread then loads neither a TypeScript loader nor the sources one by one: it starts faster
 * and holds far less memory than a thread that compiles the TypeScript itself. Built once per process
 * (again only if the file was removed meanwhile).
 *
 * @returns the absolute path of the built module
 */
export function buildReductionProcessor(): Promise<string> {
  // Calls queue behind each other, so two builds (and two esbuild services) never run at once.
  const next = (built ?? Promise.resolve(undefined)).catch(() => undefined).then(async (file) => (file && (await exists(file)) ? file : bundle()));
  built = next;
  return next;
}

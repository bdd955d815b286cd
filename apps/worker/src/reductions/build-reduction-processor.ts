import { createHash, randomUUID } from 'node:crypto';
import { access, mkdir, rename, writeFile } from 'node:fs/promises';
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
    const dir = join(tmpdir(), 'tunnelwright-worker');
    // Named by content: workers started from the same sources share one file, and a half-written file is never seen.
    const file = join(dir, `reduction-processor-${createHash('sha256').update(code).digest('hex').slice(0, 16)}.mjs`);
    if (!(await exists(file))) {
      await mkdir(dir, { recursive: true });
      const partial = `${file}.${randomUUID()}.part`;
      await writeFile(partial, code);
      await rename(partial, file);
    }
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

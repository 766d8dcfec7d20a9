/**
 * One worker thread's code as a single file: a TypeScript entry under the package root bundled with esbuild
 * (present wherever Astro is, through Vite) into a folder of the build's cache, once per version of the code it is
 * made of, so that it runs the same way from the TypeScript sources and from an installed package. Used by the
 * fitting pool (src/load/fitPool.ts) and the download writers (src/loaders/filesPool.ts).
 */
import { existsSync, mkdirSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

/**
 * The bundle `<folder>/<prefix>-<version, 16 hex digits>.mjs` of `entry`, built when missing (bundles of other
 * versions with the same prefix are deleted); undefined when it cannot be built (no esbuild, no sources).
 * @param entry the worker's TypeScript source file
 * @param version a hex digest of the code the bundle is made of
 * @example await workerBundle('src/load/fitWorker.ts', 'fit-worker', fitCodeVersion('.'), '.cache/correlary-worker') // => '.cache/correlary-worker/fit-worker-1f2e….mjs'
 */
export function workerBundle(entry: string, prefix: string, version: string, folder: string): Promise<string | undefined> {
  return workerBundles([{ entry, prefix }], version, folder)[0]!;
}

/**
 * Several bundles at once, as workerBundle makes each: those missing are made by one esbuild run, which reads the
 * sources they share once (a build whose sources changed makes three: the two workers' and the core's for the
 * server build, about half the CPU of three runs).
 * @example workerBundles([{ entry: 'src/load/fitWorker.ts', prefix: 'fit-worker' }], version, folder) // => [Promise<'…/fit-worker-1f2e….mjs'>]
 */
export function workerBundles(bundles: readonly { entry: string; prefix: string }[], version: string, folder: string): Promise<string | undefined>[] {
  // One build per bundle at a time in this process: the build's integration starts building the bundles early
  // (correlationFilesIntegration.ts) and the pools ask for them later, from other module instances.
  const building = ((globalThis as Building)[BUILDING] ??= new Map<string, Promise<string | undefined>>());
  const targets = bundles.map(({ prefix }) => path.join(folder, `${prefix}-${version.slice(0, 16)}.mjs`));
  const missing = bundles.flatMap((bundle, index) => (building.has(targets[index]!) || existsSync(targets[index]!) ? [] : [{ ...bundle, target: targets[index]! }]));
  if (missing.length > 0) {
    const made = buildBundles(missing, folder);
    missing.forEach(({ target }, index) => {
      const one = made.then((files) => files[index]).finally(() => building.delete(target));
      building.set(target, one);
    });
  }
  return targets.map((target) => building.get(target) ?? Promise.resolve(existsSync(target) ? target : undefined));
}

const BUILDING = Symbol.for('correlary.workerBundlesBuilding');
type Building = { [BUILDING]?: Map<string, Promise<string | undefined>> };

async function buildBundles(bundles: readonly { entry: string; prefix: string; target: string }[], folder: string): Promise<(string | undefined)[]> {
  const present = bundles.filter(({ entry }) => existsSync(entry));
  if (present.length === 0) return bundles.map(() => undefined);
  try {
    // Required, not imported: inside Vite's module runner (Astro's content loading) a dynamic import goes through
    // the runner, which may be closed by then.
    const { build } = createRequire(import.meta.url)('esbuild') as typeof import('esbuild');
    mkdirSync(folder, { recursive: true });
    const temporary = (target: string) => `${path.basename(target, '.mjs')}.${process.pid}.tmp`;
    await build({
      entryPoints: Object.fromEntries(present.map(({ entry, target }) => [temporary(target), entry])),
      outdir: folder,
      outExtension: { '.js': '.mjs' },
      bundle: true,
      platform: 'node',
      format: 'esm',
      target: 'node20',
      // The bundled CommonJS packages call require; an ES module has none of its own.
      banner: { js: "import { createRequire as __correlaryRequire } from 'node:module'; const require = __correlaryRequire(import.meta.url);" },
      logLevel: 'silent',
    });
    for (const { prefix, target } of present) {
      renameSync(path.join(folder, `${temporary(target)}.mjs`), target);
      // Bundles of older code are never used again.
      const old = new RegExp(`^${prefix}-[0-9a-f]{16}\\.mjs$`);
      for (const name of readdirSync(folder)) {
        if (old.test(name) && path.join(folder, name) !== target) rmSync(path.join(folder, name), { force: true });
      }
    }
    return bundles.map((bundle) => (present.includes(bundle) ? bundle.target : undefined));
  } catch {
    return bundles.map(() => undefined);
  }
}

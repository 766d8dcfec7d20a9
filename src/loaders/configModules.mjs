/**
 * The modules of src/loaders/configDoor.ts (the settings reader, schemas, integrations and content loaders that
 * astro.config.mjs and src/content.config.ts use), loaded as one JavaScript bundle that Node imports itself.
 *
 * Why: Astro imports astro.config.mjs with Node when it can, and through Vite's module runner when Node cannot (a
 * TypeScript import); src/content.config.ts always goes through a runner. A runner transforms every TypeScript
 * file one at a time (esbuild, then Vite's SSR rewrite and source maps): ~170 files behind the loaders, twice per
 * build, about 1.5 s of CPU whatever the number of correlations. Bundled once per version of the sources, the same
 * code takes ~0.05 s to import. This file is plain JavaScript so that astro.config.mjs stays loadable by Node.
 *
 * The bundle is `node_modules/.cache/correlary/config/config-<16 hex digits>.mjs` under the package root, named by
 * a SHA-256 of package.json and every script file under src/ (so a changed source is never served stale), made by
 * esbuild (present wherever Astro is, through Vite) when missing; packages other than the statistics ones and
 * ml-matrix stay imports of the installed ones, so zod, yaml and Astro are the same instances as without the
 * bundle. Both callers in a process get the same module instance (kept on globalThis). When the bundle cannot be
 * made or imported, the door is imported from its TypeScript source instead: inside Vite's runner that works as
 * before; under plain Node it throws, and Astro then loads astro.config.mjs through Vite.
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, readdirSync, renameSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const LOADED = Symbol.for('correlary.configModules');

/** Script files under `folder`, sorted, as absolute paths. */
function scriptFiles(folder) {
  let items;
  try {
    items = readdirSync(folder, { withFileTypes: true });
  } catch {
    return [];
  }
  return items
    .flatMap((item) => (item.isDirectory() ? scriptFiles(path.join(folder, item.name)) : /\.(ts|mts|js|mjs|json)$/.test(item.name) ? [path.join(folder, item.name)] : []))
    .sort();
}

/**
 * SHA-256 of package.json and every script file under src/, in hex (about 10 ms for 250 files).
 * @example sourcesDigest().length // => 64
 */
function sourcesDigest() {
  const hash = createHash('sha256');
  for (const file of [path.join(root, 'package.json'), ...scriptFiles(path.join(root, 'src'))]) {
    try {
      hash.update(path.relative(root, file)).update('\0').update(readFileSync(file)).update('\0');
    } catch {
      // unreadable: left out
    }
  }
  return hash.digest('hex');
}

/** Make the bundle at `target` (written beside it, then renamed: concurrent builds never see half a file). */
async function makeBundle(target) {
  const folder = path.dirname(target);
  const { build } = createRequire(import.meta.url)('esbuild');
  mkdirSync(folder, { recursive: true });
  const temporary = `${target}.${process.pid}.tmp`;
  // Node resolves and reads each CommonJS file of the statistics packages separately (hundreds of them, about 0.4 s
  // of CPU), so those and ml-matrix are bundled in, as scripts/build-cli.mjs does; the other packages stay imports
  // of the installed ones.
  const manifest = JSON.parse(readFileSync(path.join(root, 'package.json'), 'utf8'));
  const bundled = (name) => name.startsWith('@stdlib/') || name === 'ml-matrix';
  const external = Object.keys({ ...manifest.dependencies, ...manifest.devDependencies }).filter((name) => !bundled(name)).flatMap((name) => [name, `${name}/*`]);
  await build({
    absWorkingDir: root,
    entryPoints: [path.join(root, 'src', 'loaders', 'configDoor.ts')],
    outfile: temporary,
    bundle: true,
    external,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    // The bundled CommonJS packages require Node built-ins; an ES module has no require of its own.
    banner: { js: "import { createRequire as __correlaryRequire } from 'node:module'; const require = __correlaryRequire(import.meta.url);" },
    logLevel: 'silent',
  });
  renameSync(temporary, target);
  // Bundles of other versions of the sources are not used again.
  for (const name of readdirSync(folder)) {
    if (/^config-[0-9a-f]{16}\.mjs$/.test(name) && path.join(folder, name) !== target) rmSync(path.join(folder, name), { force: true });
  }
}

/** The bundle at `target` (made first when missing), imported. */
async function importBundle(target) {
  if (!existsSync(target)) await makeBundle(target);
  return import(/* @vite-ignore */ pathToFileURL(target).href);
}

/**
 * The modules of src/loaders/configDoor.ts, from the bundle of the current sources (made first when missing).
 * @returns {Promise<typeof import('./configDoor.ts')>}
 * @example const { correlationLoader } = await configModules()
 */
export async function configModules() {
  const holder = /** @type {{ [LOADED]?: Map<string, Promise<typeof import('./configDoor.ts')>> }} */ (globalThis);
  const loaded = (holder[LOADED] ??= new Map());
  try {
    const target = path.join(root, 'node_modules', '.cache', 'correlary', 'config', `config-${sourcesDigest().slice(0, 16)}.mjs`);
    // One promise per bundle: callers at the same time share it (and the one esbuild run it may need).
    let modules = loaded.get(target);
    if (modules === undefined) {
      modules = importBundle(target);
      loaded.set(target, modules);
      modules.catch(() => loaded.delete(target));
    }
    return await modules;
  } catch {
    return import('./configDoor.ts');
  }
}

#!/usr/bin/env node
/**
 * Compile the command line and the public modules it uses (core, schema, load; export once it exists) from the
 * TypeScript sources to JavaScript in lib/, so that an installed Correlary runs without a TypeScript transpiler.
 * The sources stay the single truth: lib/ is generated (git-ignored), by `npm pack` (prepack) and the start-up
 * benchmark. Each command is a dynamic import in src/cli/main.ts, so esbuild's code splitting gives it its own
 * chunk and start-up loads only what the command uses; the script refuses a build in which `correlary new`
 * would load the numerical libraries.
 *
 * usage: node scripts/build-cli.mjs [--outdir DIR]   (default lib)
 */
import { existsSync } from 'node:fs';
import { readFile, rm } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const root = fileURLToPath(new URL('..', import.meta.url));
const flag = process.argv.indexOf('--outdir');
const outdir = path.resolve(flag > 0 ? process.argv[flag + 1] : path.join(root, 'lib'));

/** The public doors (package.json "exports") and the command line; src/export joins when it exists. */
const doors = ['cli/main', 'core/index', 'schema/index', 'load/index', 'export/index'].filter((name) => existsSync(path.join(root, 'src', `${name}.ts`)));

// Node resolves and reads each CommonJS file of the statistics packages separately (hundreds of them, half a second
// at start-up), so those and ml-matrix are bundled in; the other dependencies stay imports of the installed packages.
const manifest = JSON.parse(await readFile(path.join(root, 'package.json'), 'utf8'));
const bundled = (name) => name.startsWith('@stdlib/') || name === 'ml-matrix';
const external = Object.keys(manifest.dependencies).filter((name) => !bundled(name)).flatMap((name) => [name, `${name}/*`]);

await rm(outdir, { recursive: true, force: true });
const result = await build({
  absWorkingDir: root,
  entryPoints: doors.map((name) => `src/${name}.ts`),
  outbase: 'src',
  outdir,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  external,
  // The bundled CommonJS packages require Node built-ins (tty, fs); ES modules have no require of their own.
  banner: { js: "import { createRequire as __correlaryRequire } from 'node:module'; const require = __correlaryRequire(import.meta.url);" },
  chunkNames: 'chunks/[name]-[hash]',
  legalComments: 'inline',
  metafile: true,
  logLevel: 'warning',
});

// Start-up guard: what `correlary new` loads statically (its chunk and the chunks and packages those import) must
// not include the numerical libraries, bundled or not.
const outputs = result.metafile.outputs;
const relative = (file) => path.relative(root, path.resolve(root, file)).split(path.sep).join('/');
const byName = new Map(Object.entries(outputs).map(([file, output]) => [relative(file), output]));
const newChunk = [...byName].find(([, output]) => Object.keys(output.inputs).includes('src/cli/new.ts'));
if (newChunk === undefined) throw new Error('build-cli requires src/cli/new.ts in the bundle');
const numerical = (name) => /(^|node_modules\/)(@stdlib\/|ml-matrix)/.test(name);
const loaded = new Set();
const heavy = new Set();
const visit = (name) => {
  if (loaded.has(name)) return;
  loaded.add(name);
  const output = byName.get(name);
  for (const input of Object.keys(output?.inputs ?? {})) if (numerical(input)) heavy.add(input.replace(/^.*node_modules\//, '').split('/').slice(0, 2).join('/'));
  for (const item of output?.imports ?? []) {
    if (item.kind !== 'import-statement') continue;
    if (item.external) {
      if (numerical(item.path)) heavy.add(item.path);
    } else visit(relative(item.path));
  }
};
visit(newChunk[0]);
if (heavy.size > 0) throw new Error(`build-cli: correlary new would load ${[...heavy].join(', ')} at start-up; keep the numerical core out of its imports`);

console.log(`compiled ${doors.map((name) => `src/${name}.ts`).join(', ')} into ${path.relative(process.cwd(), outdir) || '.'}`);

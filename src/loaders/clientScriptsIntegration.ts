/**
 * Astro integration that bundles the browser scripts itself, so that Astro has no client build to make
 * (src/components/lib/clientScript.ts says how the pages refer to them). In a build it has esbuild (present wherever
 * Astro is, through Vite) bundle src/client/entries/ when the build starts, in esbuild's own process, into a folder
 * of the build's cache; the pages ask for the files' names when they render; when the build is done the files are
 * copied into the output's `_astro/` folder. Bundled as Vite bundles the browser code (ES modules, shared code split
 * into its own files, minified, names carrying a hash of the content), so the same content gives the same files.
 */
import { copyFileSync, mkdirSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import { CLIENT_ENTRIES, offerClientScripts, type ClientEntry, type ClientScripts } from '../components/lib/clientScript.ts';

/**
 * Bundle every entry of `<root>/src/client/entries/` into `folder` (emptied first).
 * @throws Error with esbuild's messages when the scripts do not bundle
 * @example (await bundleClientScripts('.', '/tmp/scripts')).entries.equation // => 'equation.Q2X7RZ4K.js'
 */
export async function bundleClientScripts(root: string, folder: string): Promise<ClientScripts> {
  // Required, not imported: inside Vite's module runner a dynamic import goes through the runner.
  const { build } = createRequire(import.meta.url)('esbuild') as typeof import('esbuild');
  rmSync(folder, { recursive: true, force: true });
  mkdirSync(folder, { recursive: true });
  const sources = new Map(CLIENT_ENTRIES.map((entry) => [path.join(root, 'src', 'client', 'entries', `${entry}.ts`), entry]));
  const result = await build({
    absWorkingDir: root,
    entryPoints: Object.fromEntries([...sources].map(([source, entry]) => [entry, source])),
    outdir: folder,
    entryNames: '[name].[hash]',
    chunkNames: '[name].[hash]',
    bundle: true,
    splitting: true,
    format: 'esm',
    platform: 'browser',
    target: 'esnext',
    minify: true,
    charset: 'utf8',
    // Paths as seen from the project, not through symbolic links: esbuild's hashes depend on the inputs' paths, and
    // a node_modules that is a link (a workspace, a shared install) would otherwise give other file names.
    preserveSymlinks: true,
    metafile: true,
    logLevel: 'silent',
  });
  const entries: Partial<Record<ClientEntry, string>> = {};
  const files: string[] = [];
  for (const [output, info] of Object.entries(result.metafile.outputs)) {
    const name = path.basename(output);
    files.push(name);
    const entry = info.entryPoint === undefined ? undefined : sources.get(path.resolve(root, info.entryPoint));
    if (entry !== undefined) entries[entry] = name;
  }
  const missing = CLIENT_ENTRIES.filter((entry) => entries[entry] === undefined);
  if (missing.length > 0) throw new Error(`esbuild made no file for ${missing.join(', ')}`);
  return { entries: entries as Record<ClientEntry, string>, files: files.sort() };
}

/** @example defineConfig({ integrations: [clientScriptsIntegration()] }) */
export function clientScriptsIntegration(): AstroIntegration {
  let folder: string | undefined;
  let scripts: Promise<ClientScripts> | undefined;
  return {
    name: 'correlary-client-scripts',
    hooks: {
      'astro:config:setup': ({ command, config }) => {
        if (command !== 'build') return;
        // One folder per build process: two builds sharing a cache folder must not empty each other's.
        folder = fileURLToPath(new URL(`correlary-client-${process.pid}/`, config.cacheDir));
        scripts = bundleClientScripts(fileURLToPath(config.root), folder);
        offerClientScripts(scripts);
      },
      'astro:build:done': async ({ dir }) => {
        if (scripts === undefined || folder === undefined) return;
        const { files } = await scripts;
        const assets = path.join(fileURLToPath(dir), '_astro');
        mkdirSync(assets, { recursive: true });
        for (const name of files) copyFileSync(path.join(folder, name), path.join(assets, name));
        rmSync(folder, { recursive: true, force: true });
      },
    },
  };
}

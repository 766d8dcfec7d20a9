/**
 * Astro integration that keeps the numerical core out of the server build. The pages reach src/core only through
 * its door, src/core/index.ts (the formatting, cautions and the fallback that builds a page's parts itself); Rollup
 * would read, transform, parse and tree-shake its ~64 files on every build. In a build, this resolves the door, in
 * the server build only, to one bundle of the core made by esbuild (src/load/workerBundle.ts, with ml-matrix and
 * the statistics packages inside) once per version of the sources, beside the workers' bundles; the pages import
 * that file when they render. The same functions run, so the pages are the same; the browser's scripts (the client
 * build) are not touched. When the bundle cannot be made, the core is bundled by Rollup as before.
 */
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { AstroIntegration } from 'astro';
import { sourcesVersion } from '../load/fitCodeVersion.ts';
import { workerBundle } from '../load/workerBundle.ts';

/**
 * The file the core's door resolves to in the server build, or undefined (Rollup bundles the core itself).
 * @example await coreBundle('/site', '/site/node_modules/.astro/correlary-worker') // => '/site/node_modules/.astro/correlary-worker/core-1f2e….mjs'
 */
export function coreBundle(root: string, folder: string): Promise<string | undefined> {
  const { entry, prefix } = coreBundleSource(root);
  return workerBundle(entry, prefix, sourcesVersion(root), folder);
}

/** The core bundle's entry (the core's door) and name. @example coreBundleSource('.').prefix // => 'core' */
export function coreBundleSource(root: string): { entry: string; prefix: string } {
  return { entry: path.join(root, 'src', 'core', 'index.ts'), prefix: 'core' };
}

/** @example defineConfig({ integrations: [coreBundleIntegration()] }) */
export function coreBundleIntegration(): AstroIntegration {
  return {
    name: 'correlary-core-bundle',
    hooks: {
      'astro:config:setup': ({ command, config, updateConfig }) => {
        if (command !== 'build') return;
        const root = fileURLToPath(config.root);
        const door = coreBundleSource(root).entry;
        // Made while Astro starts up and syncs the content; the server build asks for it when a page imports the door.
        const bundle = coreBundle(root, fileURLToPath(new URL('correlary-worker/', config.cacheDir)));
        updateConfig({
          vite: {
            plugins: [
              {
                name: 'correlary-core-bundle',
                enforce: 'pre',
                async resolveId(this: { environment?: { name: string } }, source: string, importer: string | undefined) {
                  if (this.environment?.name !== 'ssr' || importer === undefined || !source.endsWith('/core/index.ts')) return null;
                  if (path.resolve(path.dirname(importer.split('?')[0]!), source) !== door) return null;
                  const file = await bundle;
                  // A file URL: Rollup would join an absolute path to the output folder.
                  return file === undefined ? null : { id: pathToFileURL(file).href, external: true };
                },
              },
            ],
          },
        });
      },
    },
  };
}

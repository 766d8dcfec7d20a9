/**
 * Astro integration that makes the content store cheap to bundle. Astro 5 turns its data store (the JSON file of
 * every collection entry) into a JavaScript module for the server build, written out as one large array literal
 * that Rollup parses and tree-shakes value by value (astro/dist/content/vite-plugin-content-virtual-mod.js). This
 * rewrites that module, in builds only, as `export default JSON.parse("…")` of the same file: one string for Rollup
 * and the same array for Astro (devalue.unflatten reads it), so the pages are the same. It first checks that the
 * file holds every correlation the content loader stored in this build, and has Astro save it again when it does
 * not (completeStoreFile; storedCorrelations.ts says why a save can be lost).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import { missingDigests, storedCorrelations } from './storedCorrelations.ts';

/** The id under which Astro's content plugin serves the data store (astro/dist/content/consts.js). */
const DATA_STORE_MODULE = '\0astro:data-layer-content';

/**
 * The module's code for the data store file's text: the text checked as JSON, then parsed at run time.
 * @example dataStoreModule('[["Map",1],{}]') // => 'export default JSON.parse("[[\\"Map\\",1],{}]");\n'
 */
export function dataStoreModule(json: string): string {
  JSON.parse(json); // the same check Astro's own loading makes: a broken file fails here, not at run time
  return `export default JSON.parse(${JSON.stringify(json)});\n`;
}

function readStoreFile(file: string): string | undefined {
  try {
    return readFileSync(file, 'utf8');
  } catch {
    return undefined;
  }
}

/** How long to wait for Astro's second save of the store (it comes half a second after it is asked for). */
const RESAVE_WAIT_MS = 10_000;

/**
 * The store file's text once it holds every correlation the loader stored in this build (storedCorrelations.ts):
 * as read when it does; else after having Astro save its store again, which writes what it holds in memory.
 * @throws Error when the file still lacks some of them: a site built from it would lack or misstate them
 */
export async function completeStoreFile(file: string, text: string, waitMs = RESAVE_WAIT_MS): Promise<string> {
  const stored = storedCorrelations();
  const lacking = stored === undefined ? 0 : missingDigests(text, stored.digests);
  if (stored === undefined || lacking === 0) return text;
  // Said, so that a build log shows it happened (Astro's own log is quiet about it).
  console.warn(`correlary: the content store Astro saved lacks ${lacking} of the ${stored.digests.length} correlations read in this build; saving it again`);
  stored.resave();
  let latest = text;
  for (let waited = 0; waited < waitMs; waited += 100) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    latest = readStoreFile(file) ?? latest;
    if (missingDigests(latest, stored.digests) === 0) return latest;
  }
  const missing = missingDigests(latest, stored.digests);
  throw new Error(
    `the content store Astro saved (${file}) lacks ${missing} of the ${stored.digests.length} correlations read in this build, also after saving it again; the build is stopped rather than publish a site without them. Run the build again (Astro 5.18 can lose a store save that overlaps another; see src/loaders/storedCorrelations.ts)`,
  );
}

/** @example defineConfig({ integrations: [dataStoreIntegration()] }) */
export function dataStoreIntegration(): AstroIntegration {
  return {
    name: 'correlary-data-store-module',
    hooks: {
      'astro:config:setup': ({ command, config, updateConfig }) => {
        if (command !== 'build') return;
        // In a build Astro keeps the store in its cache folder (content-layer.js getDataStoreFile).
        const file = fileURLToPath(new URL('data-store.json', config.cacheDir));
        updateConfig({
          vite: {
            plugins: [
              {
                name: 'correlary-data-store-module',
                enforce: 'post',
                async transform(code: string, id: string) {
                  if (id !== DATA_STORE_MODULE) return null;
                  let json = readStoreFile(file);
                  if (json === undefined) return null; // no store file: Astro's empty Map stands
                  json = await completeStoreFile(file, json);
                  return { code: dataStoreModule(json), map: { mappings: '' } };
                },
              },
            ],
          },
        });
      },
    },
  };
}

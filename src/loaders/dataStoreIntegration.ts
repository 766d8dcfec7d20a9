/**
 * Astro integration that makes the content store cheap to bundle. Astro 5 turns its data store (the JSON file of
 * every collection entry) into a JavaScript module for the server build, written out as one large array literal
 * that Rollup parses and tree-shakes value by value (astro/dist/content/vite-plugin-content-virtual-mod.js). This
 * rewrites that module, in builds only, as `export default JSON.parse("…")` of the same file: one string for Rollup
 * and the same array for Astro (devalue.unflatten reads it), so the pages are the same.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';

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
                transform(code: string, id: string) {
                  if (id !== DATA_STORE_MODULE) return null;
                  let json: string;
                  try {
                    json = readFileSync(file, 'utf8');
                  } catch {
                    return null; // no store file: Astro's empty Map stands
                  }
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

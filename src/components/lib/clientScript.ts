/**
 * Where a page finds its browser scripts. Each component that runs a script in the browser names one entry of
 * src/client/entries/ and puts `<PageScript entry="…" />` (src/components/PageScript.astro) where it is used.
 * - In a build, the entries are bundled by esbuild when the build starts (src/loaders/clientScriptsIntegration.ts,
 *   in esbuild's own process, while Astro starts up and fits), so that Astro has no client build to make: that was
 *   0.6–0.8 s of every build on Astro's thread, whatever the size of the handbook. The files go into the output's
 *   `_astro/` folder, named by their content's hash.
 * - Under `astro dev`, Vite serves the entry's TypeScript source itself (and reloads it when it changes).
 *
 * The integration and the pages are separate module instances (configModules.mjs loads one, the server build the
 * other), so the bundling is handed over on globalThis under a registered symbol.
 */

/** The browser scripts a page can ask for: the files of src/client/entries/, without `.ts`. */
export const CLIENT_ENTRIES = ['catalogue', 'codeSnippets', 'equation', 'fitChart', 'orderPreview'] as const;
export type ClientEntry = (typeof CLIENT_ENTRIES)[number];

/** The output of bundling the entries: each entry's file and every file to publish, names inside `_astro/`. */
export interface ClientScripts {
  readonly entries: Readonly<Record<ClientEntry, string>>;
  readonly files: readonly string[];
}

const KEY = Symbol.for('correlary.clientScripts');
type Holder = { [KEY]?: Promise<ClientScripts> };

/** @example offerClientScripts(bundleClientScripts(root, folder)) // in the build's integration */
export function offerClientScripts(scripts: Promise<ClientScripts>): void {
  scripts.catch(() => undefined); // reported by the first page that asks, not as an unhandled rejection
  (globalThis as Holder)[KEY] = scripts;
}

/**
 * The `src` of an entry's script tag: under `astro dev` its source as Vite serves it; in a build its bundle under
 * the base path.
 * @param base the site's base path (import.meta.env.BASE_URL)
 * @param dev import.meta.env.DEV
 * @throws Error in a build whose scripts were not bundled (the integration is missing, or esbuild failed)
 * @example await clientScriptSrc('equation', '/handbook/', false) // => '/handbook/_astro/equation.Q2X7RZ4K.js'
 */
export async function clientScriptSrc(entry: ClientEntry, base: string, dev: boolean): Promise<string> {
  if (dev) return `/src/client/entries/${entry}.ts`;
  const scripts = (globalThis as Holder)[KEY];
  if (scripts === undefined) {
    throw new Error(`the browser script '${entry}' was not bundled: the build needs clientScriptsIntegration() in astro.config.mjs (src/loaders/clientScriptsIntegration.ts)`);
  }
  let made: ClientScripts;
  try {
    made = await scripts;
  } catch (caught) {
    throw new Error(`the browser scripts could not be bundled: ${caught instanceof Error ? caught.message : String(caught)}`);
  }
  return `${base.replace(/\/?$/, '/')}_astro/${made.entries[entry]}`;
}

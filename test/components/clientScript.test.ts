/**
 * The pages' browser scripts: bundled by esbuild in a build (src/loaders/clientScriptsIntegration.ts), served from
 * source under `astro dev` (src/components/lib/clientScript.ts). The site test checks the built pages load them.
 */
import { mkdir, mkdtemp, readFile, rm, symlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { CLIENT_ENTRIES, clientScriptSrc, offerClientScripts } from '../../src/components/lib/clientScript.ts';
import { bundleClientScripts } from '../../src/loaders/clientScriptsIntegration.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const folders: string[] = [];
afterAll(async () => {
  for (const folder of folders) await rm(folder, { recursive: true, force: true });
});

describe('clientScriptSrc', () => {
  it('under astro dev names the entry source, which Vite serves', async () => {
    expect(await clientScriptSrc('equation', '/handbook/', true)).toBe('/src/client/entries/equation.ts');
  });

  it('in a build names the bundled file under the base path, and says why when the scripts were not bundled', async () => {
    const key = Symbol.for('correlary.clientScripts');
    const holder = globalThis as Record<symbol, unknown>;
    const before = holder[key];
    try {
      delete holder[key];
      await expect(clientScriptSrc('equation', '/', false)).rejects.toThrow(/needs clientScriptsIntegration\(\)/);
      offerClientScripts(Promise.reject(new Error('Could not resolve "../nowhere.ts"')));
      await expect(clientScriptSrc('equation', '/', false)).rejects.toThrow('the browser scripts could not be bundled: Could not resolve "../nowhere.ts"');
      const entries = Object.fromEntries(CLIENT_ENTRIES.map((entry) => [entry, `${entry}.ABCDEFGH.js`])) as Record<(typeof CLIENT_ENTRIES)[number], string>;
      offerClientScripts(Promise.resolve({ entries, files: Object.values(entries) }));
      expect(await clientScriptSrc('fitChart', '/thermal/handbook', false)).toBe('/thermal/handbook/_astro/fitChart.ABCDEFGH.js');
    } finally {
      if (before === undefined) delete holder[key];
      else holder[key] = before;
    }
  });
});

describe('bundleClientScripts', () => {
  it('bundles every page entry, the same bytes twice, with no import left that a browser could not resolve', async () => {
    const one = await mkdtemp(path.join(tmpdir(), 'correlary-client-'));
    const two = await mkdtemp(path.join(tmpdir(), 'correlary-client-'));
    folders.push(one, two);
    const first = await bundleClientScripts(root, one);
    const second = await bundleClientScripts(root, two);
    expect(second).toEqual(first);
    expect(Object.keys(first.entries).sort()).toEqual([...CLIENT_ENTRIES].sort());
    let imports = 0;
    for (const name of first.files) {
      const text = await readFile(path.join(one, name), 'utf8');
      expect(await readFile(path.join(two, name), 'utf8'), name).toBe(text);
      // Only relative imports of files made in the same run (bare package names would not load in a browser).
      for (const match of text.matchAll(/\bfrom\s*"([^"]+)"|\bimport\s*"([^"]+)"|import\(\s*"([^"]+)"\s*\)/g)) {
        const spec = (match[1] ?? match[2] ?? match[3])!;
        expect(spec, name).toMatch(/^\.\//);
        expect(first.files, name).toContain(spec.slice(2));
        imports++;
      }
    }
    // The entries share code (the chart mounting, number formatting): split into files they import.
    expect(imports).toBeGreaterThan(0);
  });

  it('gives the same files from a project whose src and node_modules are symbolic links (names hash the inputs\' paths)', async () => {
    const linked = await mkdtemp(path.join(tmpdir(), 'correlary-client-linked-'));
    const plain = await mkdtemp(path.join(tmpdir(), 'correlary-client-'));
    folders.push(linked, plain);
    const project = path.join(linked, 'project');
    await mkdir(project);
    await symlink(path.join(root, 'src'), path.join(project, 'src'));
    await symlink(path.join(root, 'node_modules'), path.join(project, 'node_modules'));
    const fromLinks = await bundleClientScripts(project, path.join(linked, 'out'));
    expect(fromLinks).toEqual(await bundleClientScripts(root, plain));
  });
});
